// Display units of each line family in the two unit systems, built on the project's unit table.
// SI stays inside; the chart prints °C, kJ/kg … (si) or °F, Btu/lb … (ip).
import { fromSI, toSI, UNITS, type Unit } from "../units/index.js";
import type { Quantity, UnitSystem } from "./types.js";

type Family = "temperature" | "enthalpy" | "entropy" | "volume" | "quality";

const DISPLAY: Record<UnitSystem, Record<Family, Unit>> = {
  si: {
    temperature: UNITS.temperature.c!,
    enthalpy: UNITS.enthalpy["kj/kg"]!,
    entropy: UNITS.entropy["kj/kgk"]!,
    volume: UNITS.volume["m3/kg"]!,
    quality: UNITS.quality[""]!,
  },
  ip: {
    temperature: UNITS.temperature.f!,
    enthalpy: UNITS.enthalpy["btu/lb"]!,
    entropy: UNITS.entropy["btu/lbr"]!,
    volume: UNITS.volume["ft3/lb"]!,
    quality: UNITS.quality[""]!,
  },
};

/** SI unit symbols of each quantity a line carries. */
export const SI_UNIT: Record<Quantity, string> = {
  temperature: "K",
  entropy: "J/(kg K)",
  "specific-volume": "m³/kg",
  quality: "",
  "saturation-liquid": "",
  "saturation-vapour": "",
  enthalpy: "J/kg",
};

const FAMILY_OF: Record<Quantity, Family> = {
  temperature: "temperature",
  entropy: "entropy",
  "specific-volume": "volume",
  quality: "quality",
  "saturation-liquid": "quality",
  "saturation-vapour": "quality",
  enthalpy: "enthalpy",
};

export function displayUnit(units: UnitSystem, q: Quantity): Unit {
  return DISPLAY[units][FAMILY_OF[q]];
}

export function toDisplay(units: UnitSystem, q: Quantity, si: number): number {
  return fromSI(si, displayUnit(units, q));
}

export function fromDisplay(units: UnitSystem, q: Quantity, value: number): number {
  return toSI(value, displayUnit(units, q));
}
