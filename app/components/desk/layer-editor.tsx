import { JOINT_TREATMENTS, LAYER_ROLES } from "~/content/detail-schema";
import type { LayerFormValues } from "~/desk/draft-form";

export interface MaterialOption {
  slug: string;
  name: string;
  family: string;
}

export interface EditableLayer extends LayerFormValues {
  /** Stable React key across reorders. */
  key: string;
}

let counter = 0;
export function newLayerKey(): string {
  counter += 1;
  return `layer-${Date.now().toString(36)}-${counter}`;
}

export const BLANK_LAYER: LayerFormValues = { role: "insulation", material: "", thickness_mm: "", framing_material: "", framing_fraction: "", joints: "" };

const cell = "rounded border border-rule bg-sheet px-2 py-1 text-sm aria-[invalid=true]:border-stop";

interface LayerEditorProps {
  layers: EditableLayer[];
  onChange: (layers: EditableLayer[]) => void;
  materials: MaterialOption[];
  errors: Record<string, string[]>;
  disabled?: boolean;
}

/**
 * The stack as rows, exterior first: add, remove and move layers; each row posts as repeated
 * `layer-*` fields in table order, which is the order the server reads.
 */
export function LayerEditor({ layers, onChange, materials, errors, disabled }: LayerEditorProps) {
  const update = (index: number, patch: Partial<LayerFormValues>) => onChange(layers.map((layer, i) => (i === index ? { ...layer, ...patch } : layer)));
  const move = (index: number, by: -1 | 1) => {
    const next = [...layers];
    const [moved] = next.splice(index, 1);
    next.splice(index + by, 0, moved);
    onChange(next);
  };
  const remove = (index: number) => onChange(layers.filter((_, i) => i !== index));
  const insert = (index: number) => onChange([...layers.slice(0, index), { ...BLANK_LAYER, key: newLayerKey() }, ...layers.slice(index)]);
  const lumber = materials.filter((m) => m.family === "lumber" || m.family === "metal");

  return (
    <div className="space-y-2" data-testid="layer-editor">
      {errors.layers ? <p className="text-sm text-stop">{errors.layers.join(" ")}</p> : null}
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Layers from exterior to interior</caption>
          <thead>
            <tr className="border-b border-graphite/40 text-left text-xs uppercase tracking-wide text-graphite-soft">
              <th className="py-1 pr-2">#</th>
              <th className="py-1 pr-2">Role</th>
              <th className="py-1 pr-2">Material</th>
              <th className="py-1 pr-2">Thickness (mm)</th>
              <th className="py-1 pr-2">Framing fraction</th>
              <th className="py-1 pr-2">Framing</th>
              <th className="py-1 pr-2">Joints</th>
              <th className="py-1"><span className="sr-only">Order</span></th>
            </tr>
          </thead>
          <tbody>
            {layers.map((layer, i) => {
              const problems = ["role", "material", "thickness_mm", "framing_fraction", "framing_material", "joints"].flatMap((field) => errors[`layers.${i}.${field}`] ?? []);
              const invalid = (field: string) => (errors[`layers.${i}.${field}`] ? true : undefined);
              return (
                <tr key={layer.key} className="border-b border-rule align-top" data-testid={`layer-row-${i}`}>
                  <td className="py-1 pr-2 tabular-nums text-graphite-soft">{i + 1}</td>
                  <td className="py-1 pr-2">
                    <select name="layer-role" aria-label={`Layer ${i + 1} role`} value={layer.role} onChange={(e) => update(i, { role: e.target.value })} className={cell} aria-invalid={invalid("role")} disabled={disabled}>
                      {LAYER_ROLES.map((role) => <option key={role} value={role}>{role.replaceAll("-", " ")}</option>)}
                    </select>
                  </td>
                  <td className="py-1 pr-2">
                    <select name="layer-material" aria-label={`Layer ${i + 1} material`} value={layer.material} onChange={(e) => update(i, { material: e.target.value })} className={`${cell} max-w-[16rem]`} aria-invalid={invalid("material")} disabled={disabled}>
                      <option value="">Choose…</option>
                      {materials.map((m) => <option key={m.slug} value={m.slug}>{m.name}</option>)}
                    </select>
                    {problems.length ? <p className="mt-1 max-w-[16rem] text-xs text-stop" data-testid={`layer-error-${i}`}>{problems.join(" ")}</p> : null}
                  </td>
                  <td className="py-1 pr-2">
                    <input name="layer-thickness_mm" aria-label={`Layer ${i + 1} thickness in mm`} inputMode="decimal" value={layer.thickness_mm} onChange={(e) => update(i, { thickness_mm: e.target.value })} className={`${cell} w-24`} aria-invalid={invalid("thickness_mm")} disabled={disabled} />
                  </td>
                  <td className="py-1 pr-2">
                    <input name="layer-framing_fraction" aria-label={`Layer ${i + 1} framing fraction`} inputMode="decimal" placeholder="none" value={layer.framing_fraction} onChange={(e) => update(i, { framing_fraction: e.target.value })} className={`${cell} w-20`} aria-invalid={invalid("framing_fraction")} disabled={disabled} />
                  </td>
                  <td className="py-1 pr-2">
                    <select name="layer-framing_material" aria-label={`Layer ${i + 1} framing material`} value={layer.framing_material} onChange={(e) => update(i, { framing_material: e.target.value })} className={cell} disabled={disabled}>
                      <option value="">{layer.framing_fraction ? "softwood lumber" : "—"}</option>
                      {lumber.map((m) => <option key={m.slug} value={m.slug}>{m.name}</option>)}
                    </select>
                  </td>
                  <td className="py-1 pr-2">
                    <select name="layer-joints" aria-label={`Layer ${i + 1} joints`} value={layer.joints} onChange={(e) => update(i, { joints: e.target.value })} className={cell} disabled={disabled}>
                      <option value="">—</option>
                      {JOINT_TREATMENTS.map((joint) => <option key={joint} value={joint}>{joint}</option>)}
                    </select>
                  </td>
                  <td className="whitespace-nowrap py-1">
                    <button type="button" onClick={() => move(i, -1)} disabled={disabled || i === 0} aria-label={`Move layer ${i + 1} outward`} className="px-1 disabled:opacity-30">↑</button>
                    <button type="button" onClick={() => move(i, 1)} disabled={disabled || i === layers.length - 1} aria-label={`Move layer ${i + 1} inward`} className="px-1 disabled:opacity-30">↓</button>
                    <button type="button" onClick={() => insert(i + 1)} disabled={disabled} aria-label={`Add a layer after layer ${i + 1}`} className="px-1">+</button>
                    <button type="button" onClick={() => remove(i)} disabled={disabled} aria-label={`Remove layer ${i + 1}`} className="px-1 text-stop">×</button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {!disabled ? (
        <button type="button" onClick={() => insert(layers.length)} className="rounded border border-rule px-3 py-1 text-sm">Add a layer on the interior side</button>
      ) : null}
    </div>
  );
}
