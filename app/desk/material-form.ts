// The material editor's fields as the browser posts them (shared by the page and the server).

export const MATERIAL_FLAGS = ["foam_plastic", "water_sensitive", "insect_risk", "solvent_sensitive", "vented_cladding"] as const;

export interface MaterialFormValues {
  name: string;
  family: string;
  thermal_kind: "conductivity" | "rsi_fixed";
  thermal_value: string;
  thermal_source: string;
  permeance_ng: string;
  at_thickness_mm: string;
  wet_cup_ng: string;
  /** One point a line: "RH %, ng/(s·m²·Pa)". */
  curve: string;
  vapour_source: string;
  flags: string[];
  notes: string;
}
