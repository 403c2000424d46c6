// Paper sizes a sheet can be set on: ISO A0–A6, US and architectural sizes, or a custom "WxH" in mm,
// in portrait or landscape; unknown names are typed errors that list what is allowed.

import { DomeprintError, inputError, show } from "../errors.js";

export type Orientation = "portrait" | "landscape";

export interface Paper {
  /** Canonical name ("A4", "Tabloid", "420x297"). */
  name: string;
  /** Trimmed page size in mm, after orientation. */
  width: number;
  height: number;
}

const INCH = 25.4;

/** Portrait sizes in mm: ISO 216 for the A series (from memory), ANSI and ARCH sizes from their inch definitions. */
const SIZES: Record<string, { name: string; width: number; height: number }> = {
  a0: { name: "A0", width: 841, height: 1189 },
  a1: { name: "A1", width: 594, height: 841 },
  a2: { name: "A2", width: 420, height: 594 },
  a3: { name: "A3", width: 297, height: 420 },
  a4: { name: "A4", width: 210, height: 297 },
  a5: { name: "A5", width: 148, height: 210 },
  a6: { name: "A6", width: 105, height: 148 },
  letter: { name: "Letter", width: 8.5 * INCH, height: 11 * INCH },
  legal: { name: "Legal", width: 8.5 * INCH, height: 14 * INCH },
  tabloid: { name: "Tabloid", width: 11 * INCH, height: 17 * INCH },
  archd: { name: "ARCH D", width: 24 * INCH, height: 36 * INCH },
  arche: { name: "ARCH E", width: 36 * INCH, height: 48 * INCH },
};

/** Custom sizes stay within what a sheet and a wide-format printer can sensibly hold. */
export const CUSTOM_RANGE_MM = { min: 50, max: 5000 } as const;

const CUSTOM = /^(\d+(?:\.\d+)?)\s*[x×]\s*(\d+(?:\.\d+)?)(?:\s*mm)?$/i;

const ORIENTATIONS: readonly Orientation[] = ["portrait", "landscape"];

export function paperNames(): string[] {
  return Object.values(SIZES).map((size) => size.name);
}

function allowedPapers(): string {
  return `${paperNames().join(", ")} or a custom size "WxH" in mm (each side ${CUSTOM_RANGE_MM.min}–${CUSTOM_RANGE_MM.max})`;
}

/** Case, spaces, hyphens and underscores are ignored: "arch-d", "ARCH D" and "archd" are one paper. */
function normalise(name: string): string {
  return name.toLowerCase().replace(/[\s_-]+/g, "");
}

function orient(width: number, height: number, orientation: Orientation): { width: number; height: number } {
  const [short, long] = width <= height ? [width, height] : [height, width];
  return orientation === "portrait" ? { width: short, height: long } : { width: long, height: short };
}

function checkOrientation(orientation: unknown): asserts orientation is Orientation | undefined {
  if (orientation !== undefined && !ORIENTATIONS.includes(orientation as Orientation))
    throw inputError("orientation", orientation, "unknown orientation", ORIENTATIONS.join(", "));
}

function customPaper(input: string, match: RegExpMatchArray, orientation: Orientation | undefined): Paper {
  const width = Number(match[1]);
  const height = Number(match[2]);
  for (const side of [width, height]) {
    if (side < CUSTOM_RANGE_MM.min || side > CUSTOM_RANGE_MM.max)
      throw inputError("paper", input, `a side of ${show(side)} mm is out of range`, `sides of ${CUSTOM_RANGE_MM.min}–${CUSTOM_RANGE_MM.max} mm`);
  }
  const size = orientation === undefined ? { width, height } : orient(width, height, orientation);
  return { name: `${match[1]}x${match[2]}`, ...size };
}

/**
 * Resolves a paper name to its trimmed size in mm. Named papers default to portrait; a custom "WxH"
 * keeps the sides as written unless an orientation is given.
 */
export function resolvePaper(name: string, orientation?: Orientation): Paper {
  checkOrientation(orientation);
  if (typeof name !== "string" || name.trim() === "") throw inputError("paper", name, "missing", allowedPapers());
  const trimmed = name.trim();
  const custom = trimmed.match(CUSTOM);
  if (custom) return customPaper(trimmed, custom, orientation);
  const size = SIZES[normalise(trimmed)];
  if (!size) {
    throw new DomeprintError("E_INPUT", `paper = ${show(name)}: unknown paper; allowed: ${allowedPapers()}`, {
      input: "paper",
      value: name,
      allowed: allowedPapers(),
      suggestions: paperNames().filter((known) => normalise(known).startsWith(normalise(trimmed).slice(0, 1))),
    });
  }
  return { name: size.name, ...orient(size.width, size.height, orientation ?? "portrait") };
}
