// The sheet spec: a small YAML or JSON file that rebuilds sheets exactly. One schema (zod), strict keys,
// values with their units as people write them ("300m", "0.5bar", "10K"); converted to SI in to-options.ts.
import { z } from "zod";

const text = z.string();
const quantity = z.union([z.string(), z.number()]);
const flag = z.boolean();

/** A design cycle on the sheet: the same inputs as `domeprint cycle`, as key: value. */
export const cycleEntrySchema = z.strictObject({
  name: text.optional(),
  evaporating: quantity.optional(),
  condensing: quantity.optional(),
  glidePoint: z.enum(["dew", "bubble", "mid"]).optional(),
  superheat: quantity.optional(),
  subcooling: quantity.optional(),
  efficiency: quantity.optional(),
  dischargeTemperature: quantity.optional(),
  suctionDrop: quantity.optional(),
  dischargeDrop: quantity.optional(),
  ihx: quantity.optional(),
  flashTank: flag.optional(),
  openIntercooler: flag.optional(),
  economiser: flag.optional(),
  intermediate: quantity.optional(),
  economiserApproach: quantity.optional(),
  gasCoolerOutlet: quantity.optional(),
  highPressure: quantity.optional(),
  optimiseHighPressure: flag.optional(),
  highPressureBounds: text.optional(),
  capacity: quantity.optional(),
});

export const windowSchema = z.strictObject({
  hMin: quantity.optional(),
  hMax: quantity.optional(),
  pMin: quantity.optional(),
  pMax: quantity.optional(),
});

export const linesSchema = z.strictObject({
  /** Steps in the display unit system: isotherm "10K" or "20F", isentrope "0.05kJ/kgK", enthalpy grid "25kJ/kg". */
  isotherm: quantity.optional(),
  isentrope: quantity.optional(),
  isenthalp: quantity.optional(),
  quality: z.number().optional(),
  /** Mantissas of the specific-volume series, e.g. [1, 2, 5]. */
  isochore: z.array(z.number()).optional(),
  /** Families to leave out, e.g. { isochores: false }. */
  isotherms: flag.optional(),
  isentropes: flag.optional(),
  isochores: flag.optional(),
  qualities: flag.optional(),
});

export const sheetEntrySchema = z.strictObject({
  fluid: text.optional(),
  /** Output base name, inside the output folder. */
  name: text.optional(),
  formats: z.union([text, z.array(text)]).optional(),
  paper: text.optional(),
  orientation: z.enum(["portrait", "landscape"]).optional(),
  units: z.enum(["si", "ip"]).optional(),
  pressure: text.optional(),
  reference: z.enum(["native", "iir", "ashrae", "nbp"]).optional(),
  style: text.optional(),
  gauge: flag.optional(),
  altitude: quantity.optional(),
  window: windowSchema.optional(),
  lines: linesSchema.optional(),
  saturationTable: flag.optional(),
  title: text.optional(),
  site: text.optional(),
  client: text.optional(),
  author: text.optional(),
  revision: text.optional(),
  notes: text.optional(),
  cycles: z.array(cycleEntrySchema).optional(),
  /** Readings files (our CSV dialect), relative to the spec file. */
  points: z.array(text).optional(),
  date: text.optional(),
  dpi: z.number().optional(),
  cmyk: flag.optional(),
  bleed: quantity.optional(),
  cropMarks: flag.optional(),
  margin: quantity.optional(),
});

export const specSchema = z.union([
  z.strictObject({ defaults: sheetEntrySchema.optional(), sheets: z.array(sheetEntrySchema).min(1) }),
  sheetEntrySchema,
]);

export type SheetEntry = z.infer<typeof sheetEntrySchema>;
export type CycleEntry = z.infer<typeof cycleEntrySchema>;
export type Spec = z.infer<typeof specSchema>;

/** Every key a spec may use at each level, for "did you mean" suggestions. */
export const KNOWN_KEYS = {
  top: ["defaults", "sheets", ...Object.keys(sheetEntrySchema.shape)],
  sheet: Object.keys(sheetEntrySchema.shape),
  window: Object.keys(windowSchema.shape),
  lines: Object.keys(linesSchema.shape),
  cycle: Object.keys(cycleEntrySchema.shape),
};
