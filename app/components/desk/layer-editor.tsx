import { getInputProps, getSelectProps, type FieldMetadata, type FormMetadata } from "@conform-to/react";
import { withoutKey } from "~/components/form-field";
import { JOINT_TREATMENTS, LAYER_ROLES } from "~/content/detail-schema";
import { BLANK_LAYER, type LayerFormValues } from "~/desk/draft-form";

export interface MaterialOption {
  slug: string;
  name: string;
  family: string;
}

const cell = "rounded border border-rule bg-sheet px-2 py-1 text-sm aria-[invalid=true]:border-stop";
const ROW_FIELDS = ["role", "material", "thickness_mm", "framing_fraction", "framing_material", "joints"] as const;

interface LayerEditorProps<Schema extends Record<string, unknown>> {
  // The editor's form, whatever else it holds: only its list intents are used here.
  form: FormMetadata<Schema, string[]>;
  layers: FieldMetadata<LayerFormValues[], Record<string, unknown>, string[]>;
  materials: MaterialOption[];
  disabled?: boolean;
}

/**
 * The stack as rows, exterior first: add, remove and move layers with conform's list intents, so each
 * row posts as `layers[i].field` and a row's errors and typed values move with it.
 */
export function LayerEditor<Schema extends Record<string, unknown>>({
  form,
  layers,
  materials,
  disabled,
}: LayerEditorProps<Schema>) {
  const rows = layers.getFieldList();
  const lumber = materials.filter((m) => m.family === "lumber" || m.family === "metal");
  const insertAt = (index: number) =>
    form.insert.getButtonProps({ name: layers.name, index, defaultValue: BLANK_LAYER });

  return (
    <div className="space-y-2" data-testid="layer-editor">
      {layers.errors ? (
        <p id={layers.errorId} className="text-sm text-stop" data-testid="error-layers">
          {layers.errors.join(" ")}
        </p>
      ) : null}
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
              <th className="py-1">
                <span className="sr-only">Order</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row, i) => {
              const fields = row.getFieldset();
              const problems = ROW_FIELDS.flatMap((field) => fields[field].errors ?? []);
              const problemsId = `${row.id}-problems`;
              // One message list per row, under the material; each invalid cell points at it.
              const described = (field: (typeof ROW_FIELDS)[number]) => ({
                "aria-describedby": fields[field].errors ? problemsId : undefined,
              });
              return (
                <tr key={row.key} className="border-b border-rule align-top" data-testid={`layer-row-${i}`}>
                  <td className="py-1 pr-2 tabular-nums text-graphite-soft">{i + 1}</td>
                  <td className="py-1 pr-2">
                    <select
                      key={fields.role.key}
                      {...withoutKey(getSelectProps(fields.role))}
                      {...described("role")}
                      aria-label={`Layer ${i + 1} role`}
                      className={cell}
                      disabled={disabled}
                    >
                      {LAYER_ROLES.map((role) => (
                        <option key={role} value={role}>
                          {role.replaceAll("-", " ")}
                        </option>
                      ))}
                    </select>
                  </td>
                  <td className="py-1 pr-2">
                    <select
                      key={fields.material.key}
                      {...withoutKey(getSelectProps(fields.material))}
                      {...described("material")}
                      aria-label={`Layer ${i + 1} material`}
                      className={`${cell} max-w-[16rem]`}
                      disabled={disabled}
                    >
                      <option value="">Choose…</option>
                      {materials.map((m) => (
                        <option key={m.slug} value={m.slug}>
                          {m.name}
                        </option>
                      ))}
                    </select>
                    {problems.length ? (
                      <p
                        id={problemsId}
                        className="mt-1 max-w-[16rem] text-xs text-stop"
                        data-testid={`layer-error-${i}`}
                      >
                        {problems.join(" ")}
                      </p>
                    ) : null}
                  </td>
                  <td className="py-1 pr-2">
                    <input
                      key={fields.thickness_mm.key}
                      {...withoutKey(getInputProps(fields.thickness_mm, { type: "text" }))}
                      {...described("thickness_mm")}
                      aria-label={`Layer ${i + 1} thickness in mm`}
                      inputMode="decimal"
                      className={`${cell} w-24`}
                      disabled={disabled}
                    />
                  </td>
                  <td className="py-1 pr-2">
                    <input
                      key={fields.framing_fraction.key}
                      {...withoutKey(getInputProps(fields.framing_fraction, { type: "text" }))}
                      {...described("framing_fraction")}
                      aria-label={`Layer ${i + 1} framing fraction`}
                      inputMode="decimal"
                      placeholder="none"
                      className={`${cell} w-20`}
                      disabled={disabled}
                    />
                  </td>
                  <td className="py-1 pr-2">
                    <select
                      key={fields.framing_material.key}
                      {...withoutKey(getSelectProps(fields.framing_material))}
                      {...described("framing_material")}
                      aria-label={`Layer ${i + 1} framing material`}
                      className={cell}
                      disabled={disabled}
                    >
                      <option value="">{fields.framing_fraction.value ? "softwood lumber" : "—"}</option>
                      {lumber.map((m) => (
                        <option key={m.slug} value={m.slug}>
                          {m.name}
                        </option>
                      ))}
                    </select>
                  </td>
                  <td className="py-1 pr-2">
                    <select
                      key={fields.joints.key}
                      {...withoutKey(getSelectProps(fields.joints))}
                      {...described("joints")}
                      aria-label={`Layer ${i + 1} joints`}
                      className={cell}
                      disabled={disabled}
                    >
                      <option value="">—</option>
                      {JOINT_TREATMENTS.map((joint) => (
                        <option key={joint} value={joint}>
                          {joint}
                        </option>
                      ))}
                    </select>
                  </td>
                  <td className="whitespace-nowrap py-1">
                    <button
                      {...form.reorder.getButtonProps({ name: layers.name, from: i, to: i - 1 })}
                      disabled={disabled || i === 0}
                      aria-label={`Move layer ${i + 1} outward`}
                      className="px-1 disabled:opacity-30"
                    >
                      ↑
                    </button>
                    <button
                      {...form.reorder.getButtonProps({ name: layers.name, from: i, to: i + 1 })}
                      disabled={disabled || i === rows.length - 1}
                      aria-label={`Move layer ${i + 1} inward`}
                      className="px-1 disabled:opacity-30"
                    >
                      ↓
                    </button>
                    <button
                      {...insertAt(i + 1)}
                      disabled={disabled}
                      aria-label={`Add a layer after layer ${i + 1}`}
                      className="px-1"
                    >
                      +
                    </button>
                    <button
                      {...form.remove.getButtonProps({ name: layers.name, index: i })}
                      disabled={disabled}
                      aria-label={`Remove layer ${i + 1}`}
                      className="px-1 text-stop"
                    >
                      ×
                    </button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {!disabled ? (
        <button {...insertAt(rows.length)} className="rounded border border-rule px-3 py-1 text-sm">
          Add a layer on the interior side
        </button>
      ) : null}
    </div>
  );
}
