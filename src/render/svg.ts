// Scene → SVG: one editor layer per scene layer, real <text> with halos, data-* attributes, clip paths,
// bleed and crop marks, in millimetres; the same scene always gives the same bytes.

import { line } from "d3-shape";
import { createRequire } from "node:module";
import type svgBuilderModule from "svg-builder";
import type { SVGBuilderInstance } from "svg-builder";
import type { CircleMark, ClipRect, Fill, Layer, Mark, PathMark, RectMark, Scene, Stroke, TextMark } from "../layout/scene.js";
import { checkScene } from "./check.js";
import { escapeXml, evenDash, mm, oneLine } from "./format.js";
import { baselineY, clockwise, haloStrokeWidth, sizeMm, weightOf } from "./label.js";
import { CROP_MARK, pageFrame, type PageFrame, type Segment } from "./page.js";

// svg-builder's ESM build imports bare directories, which Node's ESM loader refuses; its CommonJS build loads.
const svgBuilder = createRequire(import.meta.url)("svg-builder") as typeof svgBuilderModule.default;

const NS = {
  inkscape: "http://www.inkscape.org/namespaces/inkscape",
  rdf: "http://www.w3.org/1999/02/22-rdf-syntax-ns#",
  dc: "http://purl.org/dc/elements/1.1/",
  xmp: "http://ns.adobe.com/xap/1.0/",
};

type Attributes = Record<string, string | undefined>;

function attributeText(attributes: Attributes): string {
  return Object.entries(attributes)
    .filter((entry): entry is [string, string] => entry[1] !== undefined)
    .map(([name, value]) => ` ${name}="${escapeXml(value)}"`)
    .join("");
}

/**
 * svg-builder rejects data-*, inkscape:* and paint-order attributes and does not escape text, so it
 * frames the document and every child element is written here, with every value escaped.
 */
function element(name: string, attributes: Attributes, content?: string): string {
  const open = `<${name}${attributeText(attributes)}`;
  return content === undefined ? `${open}/>` : `${open}>${content}</${name}>`;
}

function dataAttributes(data: Record<string, string> | undefined): Attributes {
  return Object.fromEntries(Object.entries(data ?? {}).map(([key, value]) => [`data-${key}`, value]));
}

function strokeAttributes(stroke: Stroke | undefined): Attributes {
  if (!stroke) return {};
  return {
    stroke: stroke.colour,
    "stroke-width": mm(stroke.width),
    "stroke-dasharray": stroke.dash && stroke.dash.length > 0 ? evenDash(stroke.dash).map(mm).join(" ") : undefined,
    "stroke-opacity": stroke.opacity === undefined ? undefined : String(stroke.opacity),
    "stroke-linecap": stroke.cap,
    "stroke-linejoin": stroke.join,
  };
}

/** SVG fills shapes black by default, so an absent fill is written as none. */
function fillAttributes(fill: Fill | undefined): Attributes {
  if (!fill) return { fill: "none" };
  return { fill: fill.colour, "fill-opacity": fill.opacity === undefined ? undefined : String(fill.opacity) };
}

/** Path data through d3-shape's line builder, coordinates to 0.001 mm like every other number in the file. */
const round3 = (v: number) => Math.round(v * 1000) / 1000;
const polyline = line<[number, number]>().x((p) => round3(p[0])).y((p) => round3(p[1]));

function pathData(points: number[], closed = false): string {
  const pairs: [number, number][] = [];
  for (let i = 0; i < points.length; i += 2) pairs.push([points[i]!, points[i + 1]!]);
  return `${polyline(pairs) ?? ""}${closed ? "Z" : ""}`;
}

function clipId(id: string): string {
  return `clip-${id}`;
}

function pathElement(mark: PathMark): string {
  return element("path", {
    d: pathData(mark.points, mark.closed),
    ...fillAttributes(mark.fill),
    ...strokeAttributes(mark.stroke),
    "clip-path": mark.clip === undefined ? undefined : `url(#${clipId(mark.clip)})`,
    ...dataAttributes(mark.data),
  });
}

function rectElement(mark: RectMark): string {
  const box = { x: mm(mark.x), y: mm(mark.y), width: mm(mark.width), height: mm(mark.height) };
  return element("rect", { ...box, ...fillAttributes(mark.fill), ...strokeAttributes(mark.stroke), ...dataAttributes(mark.data) });
}

function circleElement(mark: CircleMark): string {
  const shape = { cx: mm(mark.cx), cy: mm(mark.cy), r: mm(mark.r) };
  return element("circle", { ...shape, ...fillAttributes(mark.fill), ...strokeAttributes(mark.stroke), ...dataAttributes(mark.data) });
}

/** A CSS family list with a generic fallback for viewers that do not have the bundled face installed. */
function familyList(family: string): string {
  return `${family}, sans-serif`;
}

function haloAttributes(mark: TextMark): Attributes {
  if (!mark.halo) return {};
  return { stroke: mark.halo.colour, "stroke-width": mm(haloStrokeWidth(mark)), "stroke-linejoin": "round", "paint-order": "stroke" };
}

function textElement(mark: TextMark, family: string): string {
  const angle = clockwise(mark);
  const anchor = mark.anchor ?? "start";
  return element(
    "text",
    {
      x: mm(mark.x),
      y: mm(baselineY(mark)),
      transform: angle === 0 ? undefined : `rotate(${mm(angle)} ${mm(mark.x)} ${mm(mark.y)})`,
      "font-family": familyList(family),
      "font-size": mm(sizeMm(mark)),
      "font-weight": weightOf(mark) === "bold" ? "bold" : undefined,
      "text-anchor": anchor === "start" ? undefined : anchor,
      fill: mark.colour,
      ...haloAttributes(mark),
      ...dataAttributes(mark.data),
    },
    escapeXml(oneLine(mark.text)),
  );
}

function markElement(mark: Mark, family: string): string {
  switch (mark.kind) {
    case "path":
      return pathElement(mark);
    case "rect":
      return rectElement(mark);
    case "circle":
      return circleElement(mark);
    case "text":
      return textElement(mark, family);
  }
}

function editorLayer(id: string, label: string, content: string): string {
  return element("g", { id, "inkscape:groupmode": "layer", "inkscape:label": label }, content);
}

function layerElement(layer: Layer, family: string): string {
  const marks = layer.marks.map((mark) => `${markElement(mark, family)}\n`).join("");
  return editorLayer(layer.id, layer.label, `\n${marks}`);
}

function clipDefinitions(clips: ClipRect[]): string[] {
  if (clips.length === 0) return [];
  const paths = clips.map((clip) =>
    element(
      "clipPath",
      { id: clipId(clip.id), clipPathUnits: "userSpaceOnUse" },
      element("rect", { x: mm(clip.x), y: mm(clip.y), width: mm(clip.width), height: mm(clip.height) }),
    ),
  );
  return [element("defs", {}, paths.join(""))];
}

/** Dublin Core and XMP in RDF: the open vocabulary vector editors and asset managers read from <metadata>. */
function metadataElement(scene: Scene): string {
  const { meta } = scene;
  const keywords = meta.keywords ?? [];
  const fields = [
    element("dc:title", {}, escapeXml(meta.title)),
    meta.author === undefined ? "" : element("dc:creator", {}, escapeXml(meta.author)),
    meta.subject === undefined ? "" : element("dc:description", {}, escapeXml(meta.subject)),
    keywords.length === 0 ? "" : element("dc:subject", {}, element("rdf:Bag", {}, keywords.map((k) => element("rdf:li", {}, escapeXml(k))).join(""))),
    element("dc:date", {}, escapeXml(meta.date)),
    element("xmp:CreatorTool", {}, escapeXml(meta.creator)),
  ].join("");
  const description = element("rdf:Description", { "rdf:about": "" }, fields);
  return element("metadata", {}, element("rdf:RDF", { "xmlns:rdf": NS.rdf, "xmlns:dc": NS.dc, "xmlns:xmp": NS.xmp }, description));
}

/** The page colour covers the trimmed page and its bleed, never the crop-mark margin. */
function backgroundElement(scene: Scene): string {
  const b = scene.bleed;
  const box = { x: mm(-b), y: mm(-b), width: mm(scene.width + 2 * b), height: mm(scene.height + 2 * b) };
  return element("rect", { id: "domeprint-background", ...box, fill: scene.background });
}

function segmentsData(segments: Segment[]): string {
  return segments.map((s) => `M${mm(s.x1)} ${mm(s.y1)}L${mm(s.x2)} ${mm(s.y2)}`).join("");
}

function cropMarkLayer(frame: PageFrame): string[] {
  if (frame.cropMarks.length === 0) return [];
  const path = element("path", { d: segmentsData(frame.cropMarks), fill: "none", stroke: "#000000", "stroke-width": mm(CROP_MARK.width) });
  return [editorLayer("domeprint-crop-marks", "Crop marks", path)];
}

function rootAttributes(scene: Scene): string {
  const attributes = scene.meta.attributes;
  return attributeText({
    version: "1.1",
    "xmlns:inkscape": NS.inkscape,
    "xml:space": "preserve",
    "data-domeprint": attributes === undefined ? undefined : JSON.stringify(attributes),
  }).trimStart();
}

/** svg-builder sets the page size in mm and a viewBox whose origin is the trimmed page's top-left corner. */
function documentFrame(scene: Scene, frame: PageFrame): SVGBuilderInstance {
  const doc = svgBuilder
    .create()
    .width(`${mm(frame.mediaWidth)}mm`)
    .height(`${mm(frame.mediaHeight)}mm`)
    .viewBox(`${mm(-frame.margin)} ${mm(-frame.margin)} ${mm(frame.mediaWidth)} ${mm(frame.mediaHeight)}`);
  // A function replacer, because "$" sequences in user text would otherwise be read as replacement patterns.
  doc.root = doc.root.replace("<svg ", () => `<svg ${rootAttributes(scene)} `);
  return doc;
}

export function renderSvg(scene: Scene): string {
  checkScene(scene);
  const frame = pageFrame(scene);
  const doc = documentFrame(scene, frame);
  const children = [
    element("title", {}, escapeXml(scene.meta.title)),
    ...(scene.meta.subject === undefined ? [] : [element("desc", {}, escapeXml(scene.meta.subject))]),
    metadataElement(scene),
    ...clipDefinitions(scene.clips),
    backgroundElement(scene),
    ...scene.layers.map((layer) => layerElement(layer, scene.fontFamily)),
    ...cropMarkLayer(frame),
  ];
  doc.elements.push(...children.map((child) => `\n${child}`), "\n");
  return `<?xml version="1.0" encoding="UTF-8"?>\n${doc.render()}\n`;
}
