// The unit systems a viewer may choose. Conversions and formatting stay in app/envelope/units.ts.

/** Inch-pound first: the library's readers build mostly to the IRC/IECC. */
export const UNIT_SYSTEMS = ["ip", "si"] as const;

export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

export const DEFAULT_UNIT_SYSTEM: UnitSystem = "ip";

export const UNIT_SYSTEM_LABELS: Record<UnitSystem, string> = {
  ip: "inch-pound",
  si: "SI",
};

/** The unit system a value names (a cookie, a form field, a query parameter), or null for anything else. */
export function parseUnitSystem(value: unknown): UnitSystem | null {
  return UNIT_SYSTEMS.find((system) => system === value) ?? null;
}
