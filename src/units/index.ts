// Units at the edges of domeprint: parsing, conversion and the standard atmosphere.
export { UNITS, foldUnit, atmosphereAt, toSI, fromSI, unitOf, spellings } from "./quantities.js";
export type { Quantity, Unit } from "./quantities.js";
export { parseQuantity } from "./parse.js";
