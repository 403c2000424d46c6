// Every fluid's default sheet: labels placed without touching one another, the frame, a panel or the
// dome, checked independently of the layout's own geometry; placed and dropped counts are printed.

import { describe, expect, it } from "vitest";
import { fluidIds } from "../../src/eos/index.js";
import { composeSheet } from "../../src/sheet/index.js";
import { labelProblems, unlabelledPaths } from "./label-check.js";

describe("default sheet of every fluid", () => {
  it.each(fluidIds())("%s: every label clear of the others, the frame, the panels and the dome", (id) => {
    const sheet = composeSheet({ fluid: id, date: "2025-01-01" });
    const problems = labelProblems(sheet.scene);
    const { labels } = sheet.report;
    console.info(`${id}: ${labels.placed} placed, ${labels.dropped} dropped, unlabelled lines: ${labels.unlabelled.length ? labels.unlabelled.map((u) => u.text).join("; ") : "none"}`);
    expect(problems.labels).toBe(labels.placed);
    expect(problems.labels).toBeGreaterThan(10);
    expect(problems.overlaps).toEqual([]);
    expect(problems.outsideFrame).toEqual([]);
    expect(problems.onPanels).toEqual([]);
    expect(problems.onDome).toEqual([]);
    expect(unlabelledPaths(sheet.scene)).toEqual([]);
  });
});
