// The schema of a sheet style (styles/*.json): colours, line codes, type sizes and spacing at A4,
// checked with zod on every load so a bad style file fails with the field it got wrong.

import { z } from "zod";

const colour = z.string().regex(/^#[0-9a-fA-F]{6}$/, 'a colour written "#rrggbb"');

/** Line widths are given at A4; the thinnest a sheet may print is 0.1 mm, so nothing below it is accepted. */
const width = z.number().min(0.1, "no line thinner than 0.1 mm").max(5);

export const strokeSchema = z.strictObject({
  colour,
  width,
  /** On/off lengths in mm at A4; absent for a solid line. */
  dash: z.array(z.number().min(0).max(50)).min(2).max(8).optional(),
  cap: z.enum(["butt", "round", "square"]).optional(),
});

/** Type sizes in points at A4; each is scaled with the paper and never set below 6 pt. */
const points = z.number().min(6, "no type below 6 pt").max(72);

/** The line families a LineSet can hold, each drawn with its own colour and dash or weight. */
export const FAMILIES = ["dome", "isotherm", "isentrope", "isochore", "quality"] as const;
export type Family = (typeof FAMILIES)[number];

export const styleSchema = z.strictObject({
  format: z.literal("domeprint-style/1"),
  /** Short name used on the command line (--style NAME). */
  name: z.string().regex(/^[a-z][a-z0-9-]*$/, "lower case letters, digits and hyphens"),
  title: z.string().min(1),
  /** Why the style looks as it does: the reader, the paper and the light it is made for. */
  rationale: z.string().min(40, "say in a sentence or two why the style looks as it does"),
  palette: z.strictObject({
    name: z.string().min(1),
    source: z.string().min(1),
  }),
  defaults: z.strictObject({
    paper: z.string().min(1),
    orientation: z.enum(["portrait", "landscape"]),
    saturationTable: z.boolean(),
  }),
  /** How sizes grow with the paper: factor (short side / 210 mm) ^ exponent. */
  scaling: z.strictObject({ exponent: z.number().min(0).max(1) }),
  page: z.strictObject({
    background: colour,
    ink: colour,
    muted: colour,
    /** Margin around the whole sheet in mm at A4. */
    margin: z.number().min(3).max(40),
    /** Gap between the plot and the panels, and between panels, in mm at A4. */
    gap: z.number().min(1).max(30),
  }),
  type: z.strictObject({
    heading: points,
    subheading: points,
    panelTitle: points,
    panel: points,
    axisTitle: points,
    tick: points,
    lineLabel: points,
    smallPrint: points,
  }),
  frame: strokeSchema,
  grid: z.strictObject({
    major: strokeSchema,
    minor: strokeSchema,
    /** Target distance between minor grid lines in mm at A4; the tick ladder picks the nearest round step. */
    spacing: z.number().min(1).max(30),
  }),
  lines: z.strictObject({
    dome: strokeSchema,
    isotherm: strokeSchema,
    isentrope: strokeSchema,
    isochore: strokeSchema,
    quality: strokeSchema,
  }),
  /** Line colour of each family's labels; a label prints in its line's colour unless darker ink is needed. */
  labelInk: z.strictObject({
    dome: colour,
    isotherm: colour,
    isentrope: colour,
    isochore: colour,
    quality: colour,
  }),
  labels: z.strictObject({
    /** Clearance the knock-out halo keeps around each glyph, in mm at A4. */
    halo: z.number().min(0.1).max(3),
    /** Labels wanted on each line (long lines get up to this many, spaced apart). */
    perLine: z.number().int().min(1).max(4),
    /** Least distance between two labels' boxes, in mm at A4. */
    clearance: z.number().min(0).max(10),
    weight: z.enum(["normal", "bold"]),
  }),
  cycles: z.strictObject({
    /** One colour per overlay, used in turn. */
    colours: z.array(colour).min(1),
    width,
    /** Marker radius in mm at A4. */
    marker: z.number().min(0.3).max(5),
    /** Dash for measured points' connecting path; cycles are solid. */
    pointsDash: z.array(z.number().min(0).max(50)).min(2).max(8),
  }),
  panels: z.strictObject({
    fill: colour,
    stroke: strokeSchema,
    accent: colour,
    /** Band behind the panel titles. */
    titleFill: colour,
    titleInk: colour,
    padding: z.number().min(0.5).max(20),
    /** Fill of alternate table rows, for following a row across. */
    stripe: colour,
  }),
  critical: z.strictObject({ colour, radius: z.number().min(0.3).max(5) }),
});

export type Style = z.infer<typeof styleSchema>;
export type StyleStroke = z.infer<typeof strokeSchema>;
