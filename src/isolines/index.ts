// The isoline generator: a fluid's chart lines as physical (h, p) polylines, traced to a page tolerance.
// Layout and the CLI call buildLineSet; lineSetToJson gives the data export.
export { buildLineSet } from "./line-set.js";
export { lineSetToJson } from "./json.js";
export type { LineJson, LineSetJson } from "./json.js";
export { FAMILIES } from "./options.js";
export type { Family, LineSetOptions } from "./options.js";
export type { Densities } from "./values.js";
export { DEFAULT_FRAME, pageMapping } from "./page.js";
export type { PageMapping } from "./page.js";
export { autoWindow } from "./window.js";
export type { ChartWindow, DisplayValue, Frame, Line, LineSet, Point, Quantity, TraceStats, UnitSystem } from "./types.js";
