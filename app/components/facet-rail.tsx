import { FACET_LABELS, labelFor } from "~/catalogue/vocabulary";
import { FILTER_KEYS, paramName, type CatalogueQuery, type FilterKey } from "~/catalogue/query";
import type { FacetCount } from "~/catalogue/search.server";

const ZONE_ORDER = (a: FacetCount, b: FacetCount) => a.value.localeCompare(b.value, "en", { numeric: true });

/**
 * Facet checkboxes with live counts. They sit inside the catalogue's GET form, so they work
 * without JavaScript (Apply) and, with it, the form submits on every change.
 */
export function FacetRail({ query, facets }: { query: CatalogueQuery; facets: Record<FilterKey, FacetCount[]> }) {
  return (
    <div className="space-y-5" data-testid="facet-rail">
      {FILTER_KEYS.map((key) => {
        const selected = new Set<string>(query[key]);
        // Keep selected values visible even when the other filters leave them at zero.
        const counts = new Map(facets[key].map((f) => [f.value, f.count]));
        for (const value of selected) if (!counts.has(value)) counts.set(value, 0);
        const values = [...counts].map(([value, count]) => ({ value, count })).sort(ZONE_ORDER);
        if (values.length === 0) return null;
        return (
          <fieldset key={key}>
            <legend className="mb-1 text-xs font-semibold uppercase tracking-wide text-graphite-soft">
              {FACET_LABELS[key]}
            </legend>
            <ul className={key === "zone" ? "grid grid-cols-3 gap-x-2" : "space-y-0.5"}>
              {values.map(({ value, count }) => (
                <li key={value}>
                  <label
                    className={`flex cursor-pointer items-center gap-1.5 text-sm ${count === 0 && !selected.has(value) ? "text-graphite-soft/60" : ""}`}
                  >
                    <input
                      type="checkbox"
                      name={paramName(key)}
                      value={value}
                      defaultChecked={selected.has(value)}
                      className="accent-ochre"
                    />
                    <span className="flex-1">{key === "zone" ? value : labelFor(value, key)}</span>
                    <span className="tabular-nums text-xs text-graphite-soft" data-facet-count={`${key}:${value}`}>
                      {count}
                    </span>
                  </label>
                </li>
              ))}
            </ul>
          </fieldset>
        );
      })}
    </div>
  );
}
