// Tables in panels: columns fitted to the width (the widest give way first, never below their longest word),
// cells wrapped onto as many lines as allowed, the last cut with an ellipsis only beyond that; long lists of
// figures in overlay tables folded into two halves.
import { describe, expect, it } from "vitest";
import { drawPanel, fitColumns, panelHeight, type Panel, type PanelStyle } from "../../src/layout/panel.js";
import type { Mark } from "../../src/layout/scene.js";
import { lineHeight, textWidth } from "../../src/layout/text.js";
import { overlayPanels } from "../../src/layout/sheet-panels.js";
import type { Overlay } from "../../src/cycle/overlay.js";

const style: PanelStyle = {
  pt: 8, titlePt: 9, ink: "#000000", muted: "#555555", fill: "#ffffff", stroke: { colour: "#000000", width: 0.2 },
  titleFill: "#000000", titleInk: "#ffffff", accent: "#cc0000", stripe: "#eeeeee", padding: 2,
};

const LONG = "economiser injection outlet (to the high stage)";
const panel: Panel = {
  id: "states", title: "states",
  items: [{ kind: "table", columns: ["pt", "where", "p [bar]"], units: ["", "", ""], rows: [["1", LONG, "5.167"], ["2", "  indented", "17.79"]], align: ["end", "start", "end"] }],
};

const texts = (marks: Mark[]) => marks.flatMap((m) => (m.kind === "text" ? [m] : []));

describe("panel tables", () => {
  it("fitColumns: spare width shared; when too wide the widest give way, but not below their minimum", () => {
    expect(fitColumns([10, 20], 40)).toEqual([15, 25]);
    const w = fitColumns([10, 100, 30], 80, [10, 25, 30]);
    expect(w.reduce((a, b) => a + b, 0)).toBeCloseTo(80, 9);
    expect(w[0]).toBe(10);
    expect(w[2]).toBe(30);
    expect(w[1]).toBeCloseTo(40, 6);
    // Minimums that cannot all fit: every column shares alike, as without minimums.
    expect(fitColumns([50, 50], 40, [30, 30])).toEqual(fitColumns([50, 50], 40));
  });

  it("a long cell wraps onto up to cellLines lines, the row growing with it; beyond that it ends in an ellipsis", () => {
    const width = 60; // mm: far narrower than the long cell
    expect(textWidth(LONG, style.pt)).toBeGreaterThan(width);
    const lh = lineHeight(style.pt);
    const one = panelHeight(panel, style, width, 1), three = panelHeight(panel, style, width, 3);
    const wrapped = texts(drawPanel(panel, style, 0, 0, width, three, 3)).map((t) => t.text);
    const parts = wrapped.filter((t) => t !== "" && LONG.includes(t));
    expect(parts.join(" ")).toBe(LONG); // every word shown, in order
    expect(parts.length).toBeGreaterThanOrEqual(2);
    expect(three - one).toBeCloseTo((parts.length - 1) * lh, 9); // the row grows by the extra lines
    expect(wrapped.some((t) => t.endsWith("…"))).toBe(false);
    const cut = texts(drawPanel(panel, style, 0, 0, width, one, 1)).map((t) => t.text);
    expect(cut.some((t) => t.endsWith("…") && LONG.startsWith(t.slice(0, -1)))).toBe(true);
  });

  it("a cell that fits is set as written, leading spaces (an indent) included", () => {
    const marks = texts(drawPanel(panel, style, 0, 0, 120, panelHeight(panel, style, 120, 3), 3));
    expect(marks.some((t) => t.text === "  indented")).toBe(true);
    expect(marks.some((t) => t.text === LONG)).toBe(true);
  });
});

describe("overlay tables", () => {
  const overlay = (rows: string[][]): Overlay => ({ name: "design", kind: "cycle", path: [], closed: true, points: [], tables: [{ title: "t", columns: ["", ""], rows }] });

  it("a long list of figures is set in two halves side by side, in reading order; a list of text is left whole", () => {
    const figures = Array.from({ length: 17 }, (_, i) => [`quantity ${i}`, `${i}.5 kJ/kg`]);
    const item = overlayPanels([overlay(figures)])[0]!.items[0]!;
    if (item.kind !== "table") throw new Error("not a table");
    expect(item.columns).toHaveLength(4);
    expect(item.rows).toHaveLength(9);
    expect(item.rows[0]).toEqual(["quantity 0", "0.5 kJ/kg", "quantity 9", "9.5 kJ/kg"]);
    expect(item.rows[8]).toEqual(["quantity 8", "8.5 kJ/kg", "", ""]);
    expect(item.align).toEqual(["start", "end", "start", "end"]);
    const words = Array.from({ length: 13 }, (_, i) => [`condition ${i}`, "steady flow; compressor and lines adiabatic"]);
    const whole = overlayPanels([overlay(words)])[0]!.items[0]!;
    if (whole.kind !== "table") throw new Error("not a table");
    expect(whole.rows).toHaveLength(13);
    expect(whole.columns).toHaveLength(2);
  });
});
