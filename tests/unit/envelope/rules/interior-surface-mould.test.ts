import { expect, test } from "vitest";
import { cold, mild, seasonalFlag } from "./seasonal-fixtures";

const ID = "interior-surface-mould";

// ISO 13788:2012 §5: f_Rsi = (θ_si − θ_e)/(θ_i − θ_e) with Rsi 0.25; the surface must stay below 80 % RH.
// At −5 °C outside and 20 °C / 60 % inside the surface needs f_Rsi > 0.82 (hand-derived: 80 % RH at the
// surface means a saturation pressure of 0.6·2339/0.8 = 1754 Pa, 15.4 °C; (15.4 + 5)/25 = 0.82 — D).
test("a thinly insulated wall (fill RSI 0.1) in a cold month with humid indoor air fails the temperature factor, caution — ISO 13788:2012 §5", () => {
  const f = seasonalFlag(ID, [cold, cold, ...Array(10).fill(mild)], 0.1, 60);
  expect(f?.severity).toBe("caution");
  expect(f?.explanation).toMatch(/fails/);
});

test("must not fire: the same wall with fill RSI 3.0 keeps its inside surface warm", () => {
  expect(seasonalFlag(ID, [cold, cold, ...Array(10).fill(mild)], 3.0, 60)).toBeUndefined();
});
