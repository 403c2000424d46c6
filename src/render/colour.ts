// Colour parsing and the simple sRGB → CMYK conversion used for print-shop PDFs.
// Scenes carry sRGB "#rrggbb"; only the PDF renderer converts, and only when asked.

import { inputError } from "../errors.js";

export interface Rgb {
  r: number;
  g: number;
  b: number;
}

/** CMYK in percent (0–100), the form pdfkit takes for DeviceCMYK. */
export type Cmyk = [number, number, number, number];

const HEX_COLOUR = /^#[0-9a-fA-F]{6}$/;

export function isHexColour(value: unknown): value is string {
  return typeof value === "string" && HEX_COLOUR.test(value);
}

/** Parses "#rrggbb" into 0–255 channels; anything else is an input error naming where it came from. */
export function parseHex(colour: string, input = "colour"): Rgb {
  if (!isHexColour(colour)) throw inputError(input, colour, "not an sRGB colour", 'a colour written "#rrggbb"');
  const n = Number.parseInt(colour.slice(1), 16);
  return { r: (n >> 16) & 0xff, g: (n >> 8) & 0xff, b: n & 0xff };
}

/**
 * Naive device conversion without an ICC profile: K = 1 − max(R, G, B), then C, M, Y from what is left.
 * Greys come out as pure K (so black text and lines print on one plate); saturated colours will not
 * match a press profile exactly, which a print shop's own RIP can correct from the sRGB SVG if needed.
 */
export function rgbToCmyk({ r, g, b }: Rgb): Cmyk {
  const [rn, gn, bn] = [r / 255, g / 255, b / 255];
  const k = 1 - Math.max(rn, gn, bn);
  if (k >= 1) return [0, 0, 0, 100];
  const rest = (channel: number) => percent((1 - channel - k) / (1 - k));
  return [rest(rn), rest(gn), rest(bn), percent(k)];
}

/** Rounds to 0.01 % so the PDF never carries float noise such as 99.99999999. */
function percent(fraction: number): number {
  return Math.round(fraction * 10000) / 100;
}

/** Printer's registration colour: on every separation, for crop marks. */
export const REGISTRATION: Cmyk = [100, 100, 100, 100];
