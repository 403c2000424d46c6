// Small paper: an A5 sheet gives up its saturation table and widens its panel column rather than
// overflow; A6 has no room for the panels every sheet must carry and is refused with a typed error.

import { expect, it } from "vitest";
import { DomeprintError } from "../../src/errors.js";
import { composeSheet } from "../../src/sheet/index.js";
import { labelProblems } from "./label-check.js";

it("sets A5 landscape without its table and with every label clear", () => {
  const sheet = composeSheet({ fluid: "R32", paper: "A5", orientation: "landscape", saturationTable: true, date: "2025-03-14" });
  expect(sheet.report.omitted).toContain("saturation table (too wide for this paper)");
  expect(sheet.content.saturationTable).toBeUndefined();
  const problems = labelProblems(sheet.scene);
  expect(problems.overlaps).toEqual([]);
  expect(problems.onPanels).toEqual([]);
  expect(problems.outsideFrame).toEqual([]);
});

it("refuses A6, naming the paper", () => {
  expect(() => composeSheet({ fluid: "R32", paper: "A6", orientation: "landscape", date: "2025-03-14" })).toThrow(DomeprintError);
  expect(() => composeSheet({ fluid: "R32", paper: "A6", orientation: "landscape", date: "2025-03-14" })).toThrow(/^paper: the panels do not fit/);
});
