// Sheet specs and batch builds: load and check a spec, plan its sheets, build them. Re-exports only.
export { parseSpec, loadSpec, didYouMean, type LoadedSpec } from "./load.js";
export { planSheets, checkOutputName, type PlannedSheet } from "./to-options.js";
export { buildSpec, buildFile, buildText, type BuildOptions, type BuildResult } from "./build.js";
export type { SheetOutcome } from "./render-one.js";
export { specSchema, sheetEntrySchema, cycleEntrySchema, KNOWN_KEYS, type Spec, type SheetEntry, type CycleEntry } from "./schema.js";
