// domeprint as a library: fluids and states from the property engine, isolines, cycles and readings,
// sheet specs, and finished sheets as SVG, PDF, PNG and JSON buffers. Re-exports only.
export * from "./eos/index.js";
export { DomeprintError, type ErrorCode, type ErrorDetails } from "./errors.js";
export { parseQuantity, atmosphereAt, toSI, fromSI, UNITS, type Quantity, type Unit } from "./units/index.js";
export { buildLineSet, lineSetToJson, autoWindow, type LineSet, type Line, type LineSetOptions } from "./isolines/index.js";
export {
  singleStageCycle, twoStageCycle, transcriticalCycle, optimiseHighPressure, cycleOverlay, readingsOverlay,
  parseReadings, evaluateReadings, type CycleResult, type Overlay, type SingleStageSpec, type TwoStageSpec, type TranscriticalSpec,
} from "./cycle/index.js";
export { renderSheet, checkSheetOptions, writeAtomically, type SheetOptions, type RenderedSheet } from "./sheet/index.js";
export { parseSpec, loadSpec, planSheets, buildSpec, buildFile, type LoadedSpec, type BuildResult } from "./spec/index.js";
export { renderSvg, renderPdf, renderPng, measureText } from "./render/index.js";
export type { Scene } from "./layout/scene.js";
