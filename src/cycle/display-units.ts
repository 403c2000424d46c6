// Display units of cycle and readings tables: si (°C, bar, kJ/kg) or ip (°F, psia, Btu/lb), with the
// number of digits each quantity is printed to. Conversions come from src/units; values stay SI inside.
import { fromSI, UNITS, type Unit } from "../units/index.js";

export type DisplayUnits = "si" | "ip";
export const DISPLAY_UNITS: readonly DisplayUnits[] = ["si", "ip"];

export type DisplayQuantity =
  | "temperature" | "difference" | "pressure" | "enthalpy" | "entropy" | "volume"
  | "power" | "massFlow" | "volumeFlow" | "volumetricCapacity";

interface Shown { symbol: string; unit: Unit; digits: Digits }

/** Fixed decimals, or significant figures for quantities that span decades (pressures, flows). */
type Digits = { decimals: number } | { significant: number };

const FT = UNITS.length.ft!.factor;
const LB = UNITS.density["lb/ft3"]!.factor * FT ** 3;
const BTU = UNITS.power["btu/h"]!.factor * 3600;

const SI: Record<DisplayQuantity, Shown> = {
  temperature: { symbol: "°C", unit: UNITS.temperature.c!, digits: { decimals: 1 } },
  difference: { symbol: "K", unit: UNITS["temperature-difference"].k!, digits: { decimals: 1 } },
  pressure: { symbol: "bar", unit: UNITS.pressure.bar!, digits: { significant: 4 } },
  enthalpy: { symbol: "kJ/kg", unit: UNITS.enthalpy["kj/kg"]!, digits: { decimals: 2 } },
  entropy: { symbol: "kJ/(kg K)", unit: UNITS.entropy["kj/kgk"]!, digits: { decimals: 4 } },
  volume: { symbol: "m³/kg", unit: UNITS.volume["m3/kg"]!, digits: { significant: 4 } },
  power: { symbol: "kW", unit: UNITS.power.kw!, digits: { significant: 4 } },
  massFlow: { symbol: "kg/s", unit: { symbol: "kg/s", factor: 1 }, digits: { significant: 4 } },
  volumeFlow: { symbol: "m³/h", unit: { symbol: "m³/h", factor: 1 / 3600 }, digits: { significant: 4 } },
  volumetricCapacity: { symbol: "kJ/m³", unit: { symbol: "kJ/m³", factor: 1e3 }, digits: { significant: 4 } },
};

const IP: Record<DisplayQuantity, Shown> = {
  temperature: { symbol: "°F", unit: UNITS.temperature.f!, digits: { decimals: 1 } },
  difference: { symbol: "°F", unit: UNITS["temperature-difference"].f!, digits: { decimals: 1 } },
  pressure: { symbol: "psia", unit: UNITS.pressure.psia!, digits: { significant: 4 } },
  enthalpy: { symbol: "Btu/lb", unit: UNITS.enthalpy["btu/lb"]!, digits: { decimals: 2 } },
  entropy: { symbol: "Btu/(lb °R)", unit: UNITS.entropy["btu/lbr"]!, digits: { decimals: 4 } },
  volume: { symbol: "ft³/lb", unit: UNITS.volume["ft3/lb"]!, digits: { significant: 4 } },
  power: { symbol: "Btu/h", unit: UNITS.power["btu/h"]!, digits: { significant: 5 } },
  massFlow: { symbol: "lb/min", unit: { symbol: "lb/min", factor: LB / 60 }, digits: { significant: 4 } },
  volumeFlow: { symbol: "ft³/min", unit: { symbol: "ft³/min", factor: FT ** 3 / 60 }, digits: { significant: 4 } },
  volumetricCapacity: { symbol: "Btu/ft³", unit: { symbol: "Btu/ft³", factor: BTU / FT ** 3 }, digits: { significant: 4 } },
};

export interface Formatter {
  units: DisplayUnits;
  symbol(q: DisplayQuantity): string;
  /** The value [SI] converted and printed without its unit. */
  number(q: DisplayQuantity, si: number): string;
  /** The value [SI] converted and printed with its unit. */
  withUnit(q: DisplayQuantity, si: number): string;
  /** A plain number (COP, ratio, quality) to a number of decimals. */
  plain(x: number, decimals: number): string;
}

/**
 * A formatter for a unit system. `typographic` prints negatives with the minus sign U+2212, as a
 * printed sheet should; plain output keeps the ASCII hyphen so that values paste into spreadsheets.
 */
export function formatter(units: DisplayUnits, typographic = false): Formatter {
  const table = units === "si" ? SI : IP;
  const sign = (s: string) => (typographic ? s.replace(/^-/, "−") : s);
  const digits = (x: number, d: Digits) => sign(fixed(x, d));
  const number = (q: DisplayQuantity, si: number) => digits(fromSI(si, table[q].unit), table[q].digits);
  return {
    units,
    symbol: (q) => table[q].symbol,
    number,
    withUnit: (q, si) => `${number(q, si)} ${table[q].symbol}`,
    plain: (x, decimals) => sign(fixed(x, { decimals })),
  };
}

function fixed(x: number, d: Digits): string {
  const decimals = "decimals" in d ? d.decimals : Math.max(0, d.significant - 1 - Math.floor(Math.log10(Math.abs(x) || 1)));
  const s = x.toFixed(decimals);
  // A value that rounds to zero prints without a sign.
  return /^-0\.?0*$/.test(s) ? s.slice(1) : s;
}
