import { useFetcher } from "react-router";
import { UNIT_SYSTEMS, UNIT_SYSTEM_LABELS, parseUnitSystem, type UnitSystem } from "~/vocabulary/units";

/** Switches inch-pound / SI; the choice is kept in a cookie so every page and sheet agrees. */
export function UnitsToggle({ units }: { units: UnitSystem }) {
  const fetcher = useFetcher();
  const pending = fetcher.formData?.get("units");
  const current = parseUnitSystem(pending) ?? units;
  return (
    <fetcher.Form
      method="post"
      action="/preferences/units"
      className="inline-flex overflow-hidden rounded border border-rule text-xs"
      data-testid="units-toggle"
    >
      {UNIT_SYSTEMS.map((system) => (
        <button
          type="submit"
          key={system}
          name="units"
          value={system}
          aria-pressed={current === system}
          className={`px-2 py-1 ${current === system ? "bg-graphite text-paper" : "bg-sheet text-graphite-soft hover:text-graphite"}`}
        >
          {UNIT_SYSTEM_LABELS[system]}
        </button>
      ))}
    </fetcher.Form>
  );
}
