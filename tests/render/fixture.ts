// A small hand-built scene that exercises every mark, clip, halo, rotation and awkward character.
// Invented geometry for renderer tests only; it depicts no fluid.

import type { Scene, TextMark } from "../../src/layout/scene.js";
import { FONT_FAMILY } from "../../src/render/fonts.js";

export const SPECIAL_TEXT = `a<b & "c" 'd'`;
export const NON_LATIN_TEXT = "Ø±ΔТ";

/** A4 portrait, no bleed: the PDF MediaBox must come out at exactly 595.276 × 841.890 pt. */
export function testScene(): Scene {
  return {
    width: 210,
    height: 297,
    bleed: 0,
    cropMarks: false,
    background: "#ffffff",
    fontFamily: "Noto Sans",
    clips: [{ id: "plot", x: 20, y: 20, width: 170, height: 200 }],
    meta: {
      title: `Render test <sheet> & "quotes" ${NON_LATIN_TEXT}`,
      subject: "Renderer parity fixture",
      author: "domeprint tests",
      keywords: ["test", "render", "ΔТ"],
      creator: "domeprint test suite",
      date: "2024-05-01T00:00:00Z",
      attributes: { frame: { x: 20, y: 20, width: 170, height: 200 }, note: `<&>"'` },
    },
    layers: [
      {
        id: "frame",
        label: "Plot frame",
        marks: [{ kind: "rect", x: 20, y: 20, width: 170, height: 200, stroke: { colour: "#202020", width: 0.35 } }],
      },
      {
        id: "dome",
        label: "Saturation dome",
        marks: [
          {
            kind: "path",
            points: [40, 210, 60, 120, 90, 70, 120, 60, 150, 90, 170, 210],
            closed: true,
            fill: { colour: "#3b7dd8", opacity: 0.25 },
            stroke: { colour: "#1d3f73", width: 0.6, join: "round" },
            data: { quantity: "quality", value: "0" },
            clip: "plot",
          },
        ],
      },
      {
        id: "isotherms",
        label: "Isotherms",
        marks: [
          {
            kind: "path",
            points: [5, 40, 100, 100, 205, 150],
            stroke: { colour: "#c0392b", width: 0.5, dash: [4, 2], cap: "butt" },
            data: { quantity: "T", value: "273.15", unit: "K" },
            clip: "plot",
          },
          {
            kind: "path",
            points: [5, 80, 100, 140, 205, 190],
            stroke: { colour: "#c0392b", width: 0.5, dash: [6, 1.5, 1, 1.5], opacity: 0.8, cap: "round" },
            data: { quantity: "T", value: "293.15", unit: "K" },
            clip: "plot",
          },
          {
            kind: "path",
            points: [30, 250, 180, 250],
            stroke: { colour: "#117a65", width: 1.2, cap: "square" },
            data: { quantity: "p", value: "1e5" },
          },
        ],
      },
      {
        id: "points",
        label: "Cycle points",
        marks: [
          { kind: "circle", cx: 60, cy: 120, r: 2.5, fill: { colour: "#f1c40f" }, stroke: { colour: "#000000", width: 0.4 }, data: { state: "1" } },
          { kind: "circle", cx: 150, cy: 90, r: 1.5, fill: { colour: "#8e44ad", opacity: 0.6 } },
          { kind: "rect", x: 150, y: 235, width: 30, height: 12, fill: { colour: "#ecf0f1" }, stroke: { colour: "#7f8c8d", width: 0.25, dash: [1, 1] } },
        ],
      },
      {
        id: "labels",
        label: "Labels",
        marks: [
          { kind: "text", x: 100, y: 100, text: "T = 0 °C", size: 14, colour: "#c0392b", rotate: 32, halo: { colour: "#ffffff", width: 0.8 }, anchor: "middle", baseline: "middle", data: { quantity: "T" } },
          { kind: "text", x: 25, y: 270, text: SPECIAL_TEXT, size: 16, colour: "#000000" },
          { kind: "text", x: 185, y: 285, text: NON_LATIN_TEXT, size: 18, weight: "bold", colour: "#1d3f73", anchor: "end" },
          { kind: "text", x: 105, y: 12, text: "Pressure–enthalpy test", size: 20, weight: "bold", colour: "#202020", anchor: "middle" },
          { kind: "text", x: 12, y: 120, text: "p / MPa", size: 12, colour: "#202020", rotate: 90, anchor: "middle", baseline: "middle" },
          { kind: "text", x: 165, y: 241, text: "Δh = h₂ − h₁", size: 10, colour: "#202020", anchor: "middle", baseline: "middle", halo: { colour: "#ecf0f1", width: 0.5 } },
        ],
      },
    ],
  };
}

/** The same sheet with 3 mm bleed and crop marks: the trimmed page must stay A4. */
export function bleedScene(): Scene {
  const scene = testScene();
  return { ...scene, bleed: 3, cropMarks: true, background: "#fdf6e3" };
}

/** A blank page of the given size (mm) holding only the given text marks, in one layer. */
export function textScene(marks: TextMark[], width: number, height: number): Scene {
  return {
    width,
    height,
    bleed: 0,
    cropMarks: false,
    background: "#ffffff",
    fontFamily: FONT_FAMILY,
    clips: [],
    layers: [{ id: "t", label: "Text", marks }],
    meta: { title: "t", creator: "tests", date: "2024-05-01" },
  };
}
