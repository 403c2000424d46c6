// The units a sheet prints in: SI (bar, kJ/kg, °C) or inch-pound (psi, Btu/lb, °F), with the pressure
// unit chosen separately; values stay SI inside and convert only where text is set.

import { inputError } from "../errors.js";
import { fromSI, UNITS, type Unit } from "../units/index.js";

export type UnitSystem = "si" | "ip";
export const UNIT_SYSTEMS: readonly UnitSystem[] = ["si", "ip"];
export const PRESSURE_UNITS = ["bar", "kPa", "MPa", "psi"] as const;
export type PressureUnitName = (typeof PRESSURE_UNITS)[number];

export interface DisplayUnits {
  system: UnitSystem;
  pressure: Unit;
  enthalpy: Unit;
  temperature: Unit;
  entropy: Unit;
  volume: Unit;
  density: Unit;
}

export function checkUnitSystem(value: unknown): UnitSystem {
  if (value === "si" || value === "ip") return value;
  throw inputError("units", value, "unknown unit system", UNIT_SYSTEMS.join(", "));
}

export function checkPressureUnit(value: unknown): PressureUnitName {
  const found = PRESSURE_UNITS.find((name) => typeof value === "string" && name.toLowerCase() === value.toLowerCase());
  if (!found) throw inputError("pressure", value, "not a chart pressure unit", PRESSURE_UNITS.join(", "));
  return found;
}

export function displayUnits(system: UnitSystem, pressure?: PressureUnitName): DisplayUnits {
  const si = system === "si";
  return {
    system,
    pressure: UNITS.pressure[(pressure ?? (si ? "bar" : "psi")).toLowerCase()]!,
    enthalpy: UNITS.enthalpy[si ? "kj/kg" : "btu/lb"]!,
    temperature: UNITS.temperature[si ? "c" : "f"]!,
    entropy: UNITS.entropy[si ? "kj/kgk" : "btu/lbr"]!,
    volume: UNITS.volume[si ? "m3/kg" : "ft3/lb"]!,
    density: UNITS.density[si ? "kg/m3" : "lb/ft3"]!,
  };
}

/** SI → display value. */
export function toDisplay(si: number, unit: Unit): number {
  return fromSI(si, unit);
}
