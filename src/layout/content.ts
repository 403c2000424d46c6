// What the layout engine is handed to set one sheet: the LineSet, saturation data, overlays, the fluid's
// identity and safety data, units and the user's fields — all computed beforehand, none by the layout.

import type { Overlay } from "../cycle/overlay.js";
import type { LineSet } from "../isolines/index.js";
import type { DisplayUnits } from "./display-units.js";

/** Saturation pressures at one whole temperature of the display unit (°C or °F). */
export interface SaturationTick {
  /** The temperature in the display unit, a whole number. */
  t: number;
  /** Bubble and dew pressures [Pa]; equal for a pure fluid. */
  pBubble: number;
  pDew: number;
}

/** One row of the saturation table, SI throughout; p is taken at the bubble point for blends. */
export interface SaturationRow {
  T: number;
  pBubble: number;
  pDew: number;
  rhoLiquid: number;
  rhoVapour: number;
  hLiquid: number;
  hVapour: number;
  sLiquid: number;
  sVapour: number;
}

export interface FluidIdentity {
  designation: string;
  chemicalName: string;
  formula: string;
  /** ISO 817 class as recorded in the fluid file, or null where none is recorded. */
  safetyClass: string | null;
  safetySource: string;
  safetyNote?: string;
  /** Citation of the equation of state, as one line. */
  citation: string;
  equationTitle: string;
  /** Range of validity of the equation, SI. */
  validity: { Tmin: number; Tmax: number; pmax: number };
  critical: { T: number; p: number };
  /** A blend whose bubble and dew temperatures differ. */
  glide: boolean;
  /** Reference state for h and s, in words. */
  reference: string;
  /** A real mixture's composition in words (mass fractions), printed under its name. */
  composition?: string;
  /** A real mixture's estimated binary pairs in words; printed as a flagged line. */
  estimatedPairs?: string;
}

/** The free-text fields a user may set on a sheet's title block, in the order they are printed. */
export const USER_FIELDS = ["title", "site", "client", "author", "revision", "notes"] as const;
export type UserFieldName = (typeof USER_FIELDS)[number];
export type UserFields = Partial<Record<UserFieldName, string>>;

export interface SheetContent {
  fluid: FluidIdentity;
  lines: LineSet;
  saturationScale: SaturationTick[];
  saturationTable?: SaturationRow[];
  overlays: Overlay[];
  /** Gauge scale for a site: altitude [m] and the standard atmosphere there [Pa]. */
  gauge?: { altitude: number; atmosphere: number };
  units: DisplayUnits;
  fields: UserFields;
  stamp: { date: string; version: string; hash: string };
  /** Line spacings were chosen by the user: draw every line, however tight the paper. */
  spacingGiven?: boolean;
}
