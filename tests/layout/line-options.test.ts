// Line choices handed through a sheet to the isoline generator: the window the user sets is the one on
// the page, a spacing the user sets is drawn as asked, and a family switched off is not drawn.

import { expect, it } from "vitest";
import type { PathMark } from "../../src/layout/scene.js";
import { composeSheet } from "../../src/sheet/index.js";

it("draws the user's window, isotherm spacing and families", () => {
  const sheet = composeSheet({
    fluid: "R134a",
    paper: "A4",
    orientation: "landscape",
    date: "2025-03-14",
    lineOptions: { window: { pMin: 1e5, pMax: 3e6 }, densities: { isotherm: 20 }, families: { isochores: false } },
  });
  const axes = (sheet.scene.meta.attributes as { axes: { y: { domain: number[] } } }).axes;
  expect(axes.y.domain).toEqual([1e5, 3e6]);
  const isotherms = sheet.scene.layers.find((l) => l.id === "isotherms")!.marks as PathMark[];
  const celsius = [...new Set(isotherms.map((m) => Math.round((Number(m.data!.value) - 273.15) * 1e6) / 1e6))];
  expect(celsius.length).toBeGreaterThan(5);
  for (const t of celsius) expect(Math.abs(t % 20)).toBe(0);
  expect(sheet.scene.layers.find((l) => l.id === "isochores")).toBeUndefined();
});
