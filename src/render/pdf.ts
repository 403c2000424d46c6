// Scene → PDF through pdfkit: exact page boxes from mm, the bundled font embedded as a subset, halos,
// dashes, clips and opacity drawn to match the SVG, optional CMYK; the same scene gives the same bytes.

import PDFDocument from "pdfkit";
import type { CircleMark, Colour, Fill, Mark, PathMark, RectMark, Scene, Stroke, TextMark } from "../layout/scene.js";
import { checkScene } from "./check.js";
import { parseHex, REGISTRATION, rgbToCmyk, type Cmyk } from "./colour.js";
import { fontPath } from "./fonts.js";
import { evenDash, oneLine } from "./format.js";
import { anchorShare, baselineY, clockwise, haloStrokeWidth, sizeMm, weightOf } from "./label.js";
import { CROP_MARK, pageFrame, type PageFrame } from "./page.js";

export interface PdfOptions {
  /** Write colours as DeviceCMYK through the naive conversion in colour.ts instead of DeviceRGB. */
  cmyk?: boolean;
}

const PT_PER_MM = 72 / 25.4;

/** SVG's default miter limit; PDF's own default (10) would draw sharp joins longer than the SVG does. */
const SVG_MITER_LIMIT = 4;

type Doc = PDFKit.PDFDocument;
type Paint = string | Cmyk;

interface Context {
  doc: Doc;
  scene: Scene;
  paint: (colour: Colour) => Paint;
}

function painter(cmyk: boolean): (colour: Colour) => Paint {
  return cmyk ? (colour) => rgbToCmyk(parseHex(colour)) : (colour) => colour.toLowerCase();
}

/** Page boxes in points with the origin at the sheet's lower-left corner, as PDF boxes are written. */
function box(frame: PageFrame, inset: number): number[] {
  return [inset, inset, frame.mediaWidth - inset, frame.mediaHeight - inset].map((v) => v * PT_PER_MM);
}

function documentInfo(scene: Scene): PDFKit.DocumentInfo {
  const { meta } = scene;
  const date = new Date(meta.date);
  const info: PDFKit.DocumentInfo = { Title: meta.title, Creator: meta.creator, CreationDate: date, ModDate: date };
  if (meta.subject !== undefined) info.Subject = meta.subject;
  if (meta.author !== undefined) info.Author = meta.author;
  if (meta.keywords && meta.keywords.length > 0) info.Keywords = meta.keywords.join(", ");
  return info;
}

/**
 * pdfkit stamps the current time unless CreationDate is given and derives the file ID from the info
 * dictionary, so taking both dates from the scene makes the whole file a function of the scene.
 */
function openDocument(scene: Scene, frame: PageFrame): Doc {
  const doc = new PDFDocument({
    autoFirstPage: false,
    pdfVersion: "1.7",
    compress: true,
    displayTitle: true,
    info: documentInfo(scene),
    // Starting on the bundled face keeps pdfkit from ever referencing its built-in Helvetica.
    font: fontPath("normal"),
  });
  doc.addPage({ size: [frame.mediaWidth * PT_PER_MM, frame.mediaHeight * PT_PER_MM], margin: 0 });
  if (frame.margin > 0) {
    const page = doc.page as unknown as { dictionary: { data: Record<string, unknown> } };
    page.dictionary.data.TrimBox = box(frame, frame.margin);
    page.dictionary.data.BleedBox = box(frame, frame.margin - frame.bleed);
  }
  // From here on every coordinate is page mm with the origin at the trimmed page's top-left, as in the SVG.
  doc.transform(PT_PER_MM, 0, 0, PT_PER_MM, frame.margin * PT_PER_MM, frame.margin * PT_PER_MM);
  doc.miterLimit(SVG_MITER_LIMIT);
  return doc;
}

function collect(doc: Doc): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on("data", (chunk: Buffer) => chunks.push(chunk));
    doc.on("end", () => resolve(Buffer.concat(chunks)));
    doc.on("error", reject);
  });
}

/** Dash lengths written directly: pdfkit's dash() rejects zero-length dashes, which round caps turn into dots. */
function dashOperator(dash: number[]): string {
  const lengths = evenDash(dash).map((length) => String(Math.round(length * 1e6) / 1e6));
  return `[${lengths.join(" ")}] 0 d`;
}

function applyStroke(ctx: Context, stroke: Stroke): void {
  const { doc } = ctx;
  doc.strokeColor(ctx.paint(stroke.colour)).lineWidth(stroke.width);
  if (stroke.opacity !== undefined) doc.strokeOpacity(stroke.opacity);
  if (stroke.dash && stroke.dash.length > 0) doc.addContent(dashOperator(stroke.dash));
  if (stroke.cap) doc.lineCap(stroke.cap);
  if (stroke.join) doc.lineJoin(stroke.join);
}

function applyFill(ctx: Context, fill: Fill): void {
  ctx.doc.fillColor(ctx.paint(fill.colour));
  if (fill.opacity !== undefined) ctx.doc.fillOpacity(fill.opacity);
}

/** Fill before stroke, nonzero winding: the SVG defaults. */
function paintShape(ctx: Context, stroke: Stroke | undefined, fill: Fill | undefined): void {
  if (stroke) applyStroke(ctx, stroke);
  if (fill) applyFill(ctx, fill);
  if (stroke && fill) ctx.doc.fillAndStroke();
  else if (fill) ctx.doc.fill("nonzero");
  else if (stroke) ctx.doc.stroke();
}

function clipTo(ctx: Context, id: string): void {
  const clip = ctx.scene.clips.find((c) => c.id === id);
  if (clip) ctx.doc.rect(clip.x, clip.y, clip.width, clip.height).clip();
}

function tracePath(doc: Doc, mark: PathMark): void {
  const p = mark.points;
  doc.moveTo(p[0]!, p[1]!);
  for (let i = 2; i < p.length; i += 2) doc.lineTo(p[i]!, p[i + 1]!);
  if (mark.closed) doc.closePath();
}

function drawPath(ctx: Context, mark: PathMark): void {
  if (mark.clip !== undefined) clipTo(ctx, mark.clip);
  tracePath(ctx.doc, mark);
  paintShape(ctx, mark.stroke, mark.fill);
}

function drawRect(ctx: Context, mark: RectMark): void {
  ctx.doc.rect(mark.x, mark.y, mark.width, mark.height);
  paintShape(ctx, mark.stroke, mark.fill);
}

function drawCircle(ctx: Context, mark: CircleMark): void {
  ctx.doc.circle(mark.cx, mark.cy, mark.r);
  paintShape(ctx, mark.stroke, mark.fill);
}

/** Rotation about the anchor, then the run placed by its own advance width so anchors match SVG's text-anchor. */
function drawText(ctx: Context, mark: TextMark): void {
  const { doc } = ctx;
  const text = oneLine(mark.text);
  const angle = clockwise(mark);
  if (angle !== 0) doc.rotate(angle, { origin: [mark.x, mark.y] });
  doc.font(fontPath(weightOf(mark))).fontSize(sizeMm(mark));
  const x = mark.x - anchorShare(mark) * doc.widthOfString(text);
  const y = baselineY(mark);
  const options = { lineBreak: false, baseline: "alphabetic" } as const;
  if (mark.halo) {
    doc.lineWidth(haloStrokeWidth(mark)).lineJoin("round").strokeColor(ctx.paint(mark.halo.colour));
    doc.text(text, x, y, { ...options, stroke: true, fill: false });
  }
  doc.fillColor(ctx.paint(mark.colour)).text(text, x, y, options);
}

/** Each mark in its own graphics state, so its clip, dash and opacity end with it. */
function drawMark(ctx: Context, mark: Mark): void {
  ctx.doc.save();
  switch (mark.kind) {
    case "path":
      drawPath(ctx, mark);
      break;
    case "rect":
      drawRect(ctx, mark);
      break;
    case "circle":
      drawCircle(ctx, mark);
      break;
    case "text":
      drawText(ctx, mark);
      break;
  }
  ctx.doc.restore();
}

function drawBackground(ctx: Context): void {
  const { doc, scene } = ctx;
  const b = scene.bleed;
  doc.rect(-b, -b, scene.width + 2 * b, scene.height + 2 * b).fill(ctx.paint(scene.background));
}

function drawCropMarks(ctx: Context, frame: PageFrame, cmyk: boolean): void {
  if (frame.cropMarks.length === 0) return;
  const { doc } = ctx;
  doc.save();
  for (const s of frame.cropMarks) doc.moveTo(s.x1, s.y1).lineTo(s.x2, s.y2);
  doc.lineWidth(CROP_MARK.width).strokeColor(cmyk ? REGISTRATION : "#000000").stroke();
  doc.restore();
}

export async function renderPdf(scene: Scene, options: PdfOptions = {}): Promise<Buffer> {
  checkScene(scene);
  const cmyk = options.cmyk ?? false;
  const frame = pageFrame(scene);
  const doc = openDocument(scene, frame);
  const output = collect(doc);
  const ctx: Context = { doc, scene, paint: painter(cmyk) };
  drawBackground(ctx);
  for (const layer of scene.layers) for (const mark of layer.marks) drawMark(ctx, mark);
  drawCropMarks(ctx, frame, cmyk);
  doc.end();
  return output;
}
