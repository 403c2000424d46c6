// The sheet as a library: renderSheet turns options into SVG, PDF, PNG and JSON buffers; writeAtomically
// puts them on disk. Re-exports only.
export { composeSheet, renderSheet, renderComposed, inputsHash, VERSION, type ComposedSheet, type RenderedSheet } from "./render-sheet.js";
export { checkSheetOptions, checkDate, checkFormats, today, FORMATS, type Format, type SheetOptions, type CheckedSheetOptions, type SheetLineOptions } from "./options.js";
export { writeAtomically, type OutputFile } from "./write.js";
export { defaultReference } from "./content.js";
