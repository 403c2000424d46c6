// A computed cycle and a readings file drawn on sheets: the path and its markers in the cycles layer,
// every state named, no line label across the path, and the tables set under the plot.

import { describe, expect, it } from "vitest";
import { cycleOverlay, singleStageCycle } from "../../src/cycle/index.js";
import { composeSheet } from "../../src/sheet/index.js";
import { labelProblems } from "./label-check.js";

const READINGS = new URL("../fixtures/readings-gauge.csv", import.meta.url).pathname;

describe("overlays", () => {
  it("draws a single-stage cycle with its states named and line labels kept off its path", () => {
    const cycle = singleStageCycle({ fluid: "R290", reference: "iir", evaporating: { T: 263.15 }, condensing: { T: 313.15 }, superheat: 5, subcooling: 3, compressor: { efficiency: 0.7 } });
    const sheet = composeSheet({ fluid: "R290", reference: "iir", paper: "A3", orientation: "landscape", overlays: [cycleOverlay(cycle, "si", "design")], date: "2025-03-14" });
    const layer = sheet.scene.layers.find((l) => l.id === "cycles")!;
    expect(layer.marks.filter((m) => m.kind === "path").length).toBeGreaterThan(0);
    expect(layer.marks.filter((m) => m.kind === "circle").length).toBe(cycle.points.length);
    expect(sheet.report.pointLabels).toEqual({ placed: cycle.points.length, dropped: 0 });
    const problems = labelProblems(sheet.scene);
    expect(problems.onOverlays).toEqual([]);
    expect(problems.overlaps).toEqual([]);
    expect(problems.onPanels).toEqual([]);
  });

  it("evaluates a readings file in the sheet's reference state and sets its table under the plot", () => {
    const sheet = composeSheet({ fluid: "R134a", style: "client-report", pointsFiles: [READINGS], altitude: 1500, date: "2025-03-14" });
    const texts = sheet.scene.layers.find((l) => l.id === "cycles")!.marks.flatMap((m) => (m.kind === "text" ? [m.text] : []));
    expect(texts.sort()).toEqual(["discharge", "evaporator out", "liquid", "suction"]);
    const frame = (sheet.scene.meta.attributes as { plotFrame: { y: number; height: number } }).plotFrame;
    const tableTitle = sheet.scene.layers.find((l) => l.id === "panels")!.marks.find((m) => m.kind === "text" && m.text === "test cooler, gauge readings");
    expect(tableTitle && tableTitle.kind === "text" && tableTitle.y).toBeGreaterThan(frame.y + frame.height);
    expect(labelProblems(sheet.scene).onOverlays).toEqual([]);
  });
});
