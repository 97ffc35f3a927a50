import { createCookie } from "react-router";
import { DEFAULT_UNIT_SYSTEM, parseUnitSystem, type UnitSystem } from "~/vocabulary/units";

// Not a secret and not personal: a plain cookie any visitor can hold.
const unitsCookie = createCookie("dryside_units", {
  path: "/",
  sameSite: "lax",
  httpOnly: true,
  maxAge: 60 * 60 * 24 * 365,
});

export async function unitsFor(request: Request): Promise<UnitSystem> {
  const value = await unitsCookie.parse(request.headers.get("Cookie"));
  return parseUnitSystem(value) ?? DEFAULT_UNIT_SYSTEM;
}

export function serializeUnits(units: UnitSystem): Promise<string> {
  return unitsCookie.serialize(units);
}
