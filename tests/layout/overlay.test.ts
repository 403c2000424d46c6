// A computed cycle and a readings file drawn on sheets: the path and its markers in the cycles layer,
// every state named, no line label across the path, and the tables set under the plot.

import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { cycleOverlay, singleStageCycle } from "../../src/cycle/index.js";
import { DomeprintError } from "../../src/errors.js";
import { composeSheet, renderSheet } from "../../src/sheet/index.js";
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

  it("reads a cycle file, draws it beside readings, and renders the sheet", async () => {
    const dir = mkdtempSync(join(tmpdir(), "domeprint-cycle-"));
    const file = join(dir, "design.yaml");
    writeFileSync(file, "name: design\nevaporating: -10C\ncondensing: 40C\nsuperheat: 5K\nsubcooling: 3K\nefficiency: 0.7\n");
    const sheet = await renderSheet({ fluid: "R134a", style: "client-report", cycleFiles: [file], pointsFiles: [READINGS], formats: ["svg"], date: "2025-03-14" });
    const layer = sheet.scene.layers.find((l) => l.id === "cycles")!;
    expect(layer.marks.filter((m) => m.kind === "circle").length).toBe(4 + 4);
    expect(sheet.svg!.toString()).toContain("design: states");
    const problems = labelProblems(sheet.scene);
    expect(problems.onOverlays).toEqual([]);
    expect(problems.onPanels).toEqual([]);
    writeFileSync(file, "evaporating: -10C\ncondensor: 40C\n");
    expect(() => composeSheet({ fluid: "R134a", cycleFiles: [file], date: "2025-03-14" })).toThrow(DomeprintError);
    expect(() => composeSheet({ fluid: "R134a", cycleFiles: [file], date: "2025-03-14" })).toThrow(/condensor/);
  });
});
