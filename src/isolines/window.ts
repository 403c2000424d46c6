// The chart window a fluid gets unless the caller sets one: the dome from a low practical temperature (or the
// triple point) up to 1.5–2 × p_c, and enthalpy from the cold liquid to vapour well superheated.
import { flashTP, H, propertiesTRho, referenceOffset, saturationPressureRange, saturationT, type Fluid, type ReferenceName } from "../eos/index.js";
import { inputError } from "../errors.js";
import { fromDisplay, toDisplay } from "./display.js";
import { clean, niceAtLeast, niceAtMost, ONE_TWO_FIVE, WINDOW_MANTISSAS } from "./nice.js";
import type { ChartWindow, UnitSystem } from "./types.js";

/** The coldest evaporating temperature a chart shows by default: −60 °C, or 0.57 T_c for cryogens and low-T_c fluids. */
export function lowTemperature(f: Fluid): number {
  return Math.max(f.Tmin, Math.min(0.57 * f.Tc, 213.15));
}

/** The hottest vapour the default window reaches: 1.3 T_c (above usual compressor discharge), within T_max. */
export function hotTemperature(f: Fluid): number {
  return Math.min(f.Tmax, 1.3 * f.Tc);
}

/** Lowest pressure with a saturated liquid: at the triple point (pure fluids) or the bubble pressure at T_min (blends). */
export function domeFloorPressure(f: Fluid): number {
  return saturationPressureRange(f)[0];
}

export function autoWindow(f: Fluid, reference: ReferenceName, units: UnitSystem): ChartWindow {
  const off = referenceOffset(f, reference);
  const Tlow = lowTemperature(f);
  const sat = saturationT(f, Tlow);
  const floor = domeFloorPressure(f);
  const pRound = niceAtMost(sat.pL, WINDOW_MANTISSAS);
  const pMin = pRound >= floor ? pRound : floor;
  const pMax = Math.min(niceAtLeast(1.5 * f.pc, WINDOW_MANTISSAS), f.pmax);
  const o = new Float64Array(f.tmp.length);
  propertiesTRho(f.model, f.M, sat.TL, sat.rhoL, o);
  const hCold = o[H]! + off.dh;
  const hHot = flashTP(f, hotTemperature(f), pMin, reference).h;
  // Room for subcooled liquid colder than the window's floor, unless the floor is the triple point.
  const margin = Tlow > f.Tmin ? 0.03 * (hHot - hCold) : 0;
  return { ...roundEnthalpyWindow(units, hCold - margin, hHot), pMin, pMax };
}

/** The window's h limits [J/kg] widened to round values of the display unit (a 1–2–5 step of about 1/40 of the span). */
export function roundEnthalpyWindow(units: UnitSystem, hLow: number, hHigh: number): { hMin: number; hMax: number } {
  const lo = toDisplay(units, "enthalpy", hLow), hi = toDisplay(units, "enthalpy", hHigh);
  const step = niceAtLeast((hi - lo) / 40, ONE_TWO_FIVE);
  return {
    hMin: fromDisplay(units, "enthalpy", clean(Math.floor(lo / step) * step)),
    hMax: fromDisplay(units, "enthalpy", clean(Math.ceil(hi / step) * step)),
  };
}

function finite(name: string, v: unknown): number | undefined {
  if (v === undefined) return undefined;
  if (typeof v !== "number" || !Number.isFinite(v)) throw inputError(`window.${name}`, v, "not a finite number", "a finite number in SI (J/kg for h, Pa for p)");
  return v;
}

/** The automatic window with the caller's limits laid over it; limits are SI (h in the chosen reference). */
export function resolveWindow(auto: ChartWindow, overrides: Partial<ChartWindow> | undefined, f: Fluid): ChartWindow {
  const o = overrides ?? {};
  const w: ChartWindow = {
    hMin: finite("hMin", o.hMin) ?? auto.hMin,
    hMax: finite("hMax", o.hMax) ?? auto.hMax,
    pMin: finite("pMin", o.pMin) ?? auto.pMin,
    pMax: finite("pMax", o.pMax) ?? auto.pMax,
  };
  if (!(w.hMax > w.hMin)) throw inputError("window.hMax", w.hMax, `not above window.hMin = ${w.hMin} J/kg`, "hMax > hMin");
  if (!(w.pMin > 0)) throw inputError("window.pMin", w.pMin, "must be positive (the pressure axis is logarithmic)", "pMin > 0 Pa");
  if (!(w.pMax > w.pMin)) throw inputError("window.pMax", w.pMax, `not above window.pMin = ${w.pMin} Pa`, "pMax > pMin");
  if (w.pMin >= f.pmax) throw inputError("window.pMin", w.pMin, `at or above the equation's p_max for ${f.id}`, `pMin < ${f.pmax} Pa`);
  // A floor on the dome's lowest pressure is lifted by a rounding error: the engine's saturation at T_min can
  // land an ulp below that pressure, and the engine would call such a point solid.
  const floor = domeFloorPressure(f);
  if (Math.abs(w.pMin / floor - 1) < 4e-12) w.pMin = floor * (1 + 4e-12);
  return w;
}
