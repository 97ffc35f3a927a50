import { useFetcher } from "react-router";
import type { UnitSystem } from "~/envelope/units";

/** Switches inch-pound / SI; the choice is kept in a cookie so every page and sheet agrees. */
export function UnitsToggle({ units }: { units: UnitSystem }) {
  const fetcher = useFetcher();
  const pending = fetcher.formData?.get("units");
  const current = (pending === "si" || pending === "ip" ? pending : units) as UnitSystem;
  return (
    <fetcher.Form method="post" action="/preferences/units" className="inline-flex overflow-hidden rounded border border-rule text-xs" data-testid="units-toggle">
      {(["ip", "si"] as const).map((system) => (
        <button
          key={system}
          name="units"
          value={system}
          aria-pressed={current === system}
          className={`px-2 py-1 ${current === system ? "bg-graphite text-paper" : "bg-sheet text-graphite-soft hover:text-graphite"}`}
        >
          {system === "ip" ? "inch-pound" : "SI"}
        </button>
      ))}
    </fetcher.Form>
  );
}
