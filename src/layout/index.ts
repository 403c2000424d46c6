// The layout engine's public face: plan a page, lay a sheet's content out as a Scene, load styles.
// Re-exports only; the renderers draw what this returns.
export { planPage, type PagePlan, type PlanOptions } from "./plan.js";
export { layoutSheet, overlayBandHeight, panelMinWidth, type LaidOutSheet, type SheetReport } from "./sheet-layout.js";
export { USER_FIELDS } from "./content.js";
export type { FluidIdentity, SaturationRow, SaturationTick, SheetContent, UserFieldName, UserFields } from "./content.js";
export { displayUnits, checkPressureUnit, checkUnitSystem, PRESSURE_UNITS, UNIT_SYSTEMS, type DisplayUnits, type PressureUnitName, type UnitSystem } from "./display-units.js";
export { loadStyle, parseStyle, styleNames, STYLE_DIR, DEFAULT_STYLE } from "./style-file.js";
export { styleSchema, FAMILIES, type Family, type Style } from "./style.js";
export { cautionsFor, DEFERRAL, type Caution } from "./cautions.js";
export { resolvePaper, paperNames, type Orientation, type Paper } from "./paper.js";
export type { Scene, Layer, Mark } from "./scene.js";
