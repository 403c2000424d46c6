// Number and text formatting shared by the renderers: millimetre rounding, XML escaping, one-line labels.
// Kept pure and tiny so the SVG and PDF outputs are byte-for-byte reproducible.

/** Rounds a length to 0.001 mm and prints it without trailing zeros or a negative zero. */
export function mm(value: number): string {
  const rounded = Math.round(value * 1000) / 1000;
  return String(rounded === 0 ? 0 : rounded);
}

/** XML 1.0 forbids most C0 controls, lone surrogates and U+FFFE/U+FFFF even when escaped. */
const XML_FORBIDDEN = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

const XML_ENTITIES: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&apos;" };

/** Escapes text for XML content and double- or single-quoted attributes; non-Latin characters pass through as UTF-8. */
export function escapeXml(text: string): string {
  return text.replace(XML_FORBIDDEN, "\uFFFD").replace(/[&<>"']/g, (ch) => XML_ENTITIES[ch] ?? ch);
}

/**
 * A label is one line: line breaks, tabs and other controls become single spaces, so the SVG
 * (which would collapse them) and the PDF (which would start a new line) draw the same run.
 */
export function oneLine(text: string): string {
  return text.replace(/[\u0000-\u001F\u007F-\u009F\u2028\u2029]/g, " ");
}

/** SVG repeats an odd dash list to make it even; writing it doubled keeps SVG and PDF readers in step. */
export function evenDash(dash: number[]): number[] {
  return dash.length % 2 === 1 ? [...dash, ...dash] : dash;
}
