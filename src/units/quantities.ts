// Units at the edges: each quantity's accepted unit spellings and their conversion to SI.
// Values inside domeprint are SI (K, Pa, J/kg, J/(kg K), kg/m³, m³/kg, W); only parsing and display convert.

export type Quantity = "temperature" | "temperature-difference" | "pressure" | "enthalpy" | "entropy" | "density" | "volume" | "quality" | "power" | "length";

/** A linear unit: SI = value × factor + offset. `gauge` marks a pressure read against the atmosphere. */
export interface Unit { symbol: string; factor: number; offset?: number; gauge?: boolean }

const BTU = 1055.05585262; // International Table Btu [J]
const LB = 0.45359237; // [kg]
const FT = 0.3048; // [m]
const PSI = 6894.757293168361; // [Pa]

function u(symbol: string, factor: number, extra: Partial<Unit> = {}): Unit {
  return { symbol, factor, ...extra };
}

/** Accepted spellings (folded: lower case, no spaces, no brackets, no ·, no degree sign) per quantity. */
export const UNITS: Record<Quantity, Record<string, Unit>> = {
  temperature: {
    k: u("K", 1),
    c: u("°C", 1, { offset: 273.15 }), degc: u("°C", 1, { offset: 273.15 }),
    f: u("°F", 5 / 9, { offset: 273.15 - (32 * 5) / 9 }), degf: u("°F", 5 / 9, { offset: 273.15 - (32 * 5) / 9 }),
    r: u("°R", 5 / 9),
  },
  "temperature-difference": { k: u("K", 1), c: u("K", 1), degc: u("K", 1), f: u("°F", 5 / 9), degf: u("°F", 5 / 9), r: u("°R", 5 / 9) },
  pressure: {
    pa: u("Pa", 1), kpa: u("kPa", 1e3), mpa: u("MPa", 1e6), bar: u("bar", 1e5), mbar: u("mbar", 100), hpa: u("hPa", 100),
    psi: u("psi", PSI), psia: u("psia", PSI), atm: u("atm", 101325),
    pag: u("Pa(g)", 1, { gauge: true }), kpag: u("kPa(g)", 1e3, { gauge: true }), mpag: u("MPa(g)", 1e6, { gauge: true }),
    barg: u("bar(g)", 1e5, { gauge: true }), psig: u("psig", PSI, { gauge: true }),
  },
  enthalpy: { "j/kg": u("J/kg", 1), "kj/kg": u("kJ/kg", 1e3), "btu/lb": u("Btu/lb", BTU / LB), "btu/lbm": u("Btu/lb", BTU / LB) },
  entropy: {
    "j/kgk": u("J/(kg K)", 1), "kj/kgk": u("kJ/(kg K)", 1e3),
    "btu/lbr": u("Btu/(lb °R)", BTU / LB / (5 / 9)), "btu/lbf": u("Btu/(lb °F)", BTU / LB / (5 / 9)), "btu/lbmr": u("Btu/(lb °R)", BTU / LB / (5 / 9)),
  },
  density: { "kg/m3": u("kg/m³", 1), "g/cm3": u("g/cm³", 1000), "g/l": u("g/L", 1), "lb/ft3": u("lb/ft³", LB / FT ** 3) },
  volume: { "m3/kg": u("m³/kg", 1), "l/kg": u("L/kg", 1e-3), "dm3/kg": u("dm³/kg", 1e-3), "ft3/lb": u("ft³/lb", FT ** 3 / LB) },
  quality: { "": u("", 1), "%": u("%", 0.01) },
  power: { w: u("W", 1), kw: u("kW", 1e3), mw: u("MW", 1e6), tr: u("TR", 3516.8528420667), "btu/h": u("Btu/h", BTU / 3600) },
  length: { m: u("m", 1), km: u("km", 1000), ft: u("ft", FT) },
};

/** Folds a unit spelling: lower case, without spaces, brackets, middle dots, degree signs or superscripts. */
export function foldUnit(s: string): string {
  return s.toLowerCase().replace(/[\s()·*_°]/g, "").replace(/³/g, "3").replace(/\(g\)/g, "g");
}

/** The standard-atmosphere pressure [Pa] at an altitude [m] (barometric formula, ISO 2533 troposphere). */
export function atmosphereAt(altitude: number): number {
  return 101325 * Math.pow(1 - 2.25577e-5 * altitude, 5.25588);
}

export function toSI(value: number, unit: Unit, atmosphere = 101325): number {
  return value * unit.factor + (unit.offset ?? 0) + (unit.gauge ? atmosphere : 0);
}

export function fromSI(si: number, unit: Unit, atmosphere = 101325): number {
  return (si - (unit.offset ?? 0) - (unit.gauge ? atmosphere : 0)) / unit.factor;
}

export function unitOf(q: Quantity, spelling: string): Unit | undefined {
  return UNITS[q][foldUnit(spelling)];
}

export function spellings(q: Quantity): string[] {
  return [...new Set(Object.values(UNITS[q]).map((x) => x.symbol))];
}
