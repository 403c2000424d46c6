// The placement optimiser on lines made for the purpose: crowded parallels, a line that must not be
// crossed, a box to keep off, a line too short to carry its label, and a preference it should follow.

import { describe, expect, it } from "vitest";
import { boxesIntersect, box, boxInside, corners, grow, segmentHitsBox, type Rect } from "../../src/layout/geometry.js";
import { placeLabels, type LabelRequest } from "../../src/layout/label-placement.js";
import { SpatialGrid } from "../../src/layout/spatial-grid.js";

const region: Rect = { x: 0, y: 0, width: 200, height: 120 };

function request(owner: string, text: string, pieces: number[][], prefer: (x: number, y: number) => number = () => 0): LabelRequest {
  return { owner, family: "isotherm", text, sizePt: 8, weight: "normal", pieces, priority: 1, wanted: 1, prefer, align: "row" };
}

function run(requests: LabelRequest[], hard: { owner: string; points: number[] }[] = [], boxes: Rect[] = []) {
  const lines = new SpatialGrid(8);
  for (const r of requests) for (const p of r.pieces) lines.addPolyline(r.owner, p);
  const obstacles = new SpatialGrid(10);
  for (const h of hard) obstacles.addPolyline(h.owner, h.points);
  boxes.forEach((b, i) => obstacles.addBox(`panel-${i}`, box(b.x + b.width / 2, b.y + b.height / 2, b.width / 2, b.height / 2)));
  return placeLabels({ requests, region, inset: 1, clearance: 0.8, lines, obstacles, hardOwners: new Set(hard.map((h) => h.owner)), halo: 0.4 });
}

describe("label placement", () => {
  it("labels crowded parallel lines without any two labels touching", () => {
    const requests = Array.from({ length: 25 }, (_, i) => request(`line-${i}`, `${i * 10 - 40} °C`, [[10 + i * 7, 115, 30 + i * 7, 5]]));
    const { labels, report } = run(requests);
    expect(report.placed).toBe(25);
    expect(report.unlabelled).toEqual([]);
    for (let i = 0; i < labels.length; i++) {
      expect(boxInside(labels[i]!.box, region, 1)).toBe(true);
      for (let j = i + 1; j < labels.length; j++) expect(boxesIntersect(grow(labels[i]!.box, 0.39), labels[j]!.box)).toBe(false);
    }
  });

  it("keeps labels off a line that must stay whole and off a panel", () => {
    const wall = [100, 0, 100, 120];
    const panel = { x: 0, y: 0, width: 60, height: 120 };
    const requests = Array.from({ length: 8 }, (_, i) => request(`h-${i}`, `${i} bar`, [[0, 10 + i * 13, 200, 10 + i * 13]]));
    const { labels } = run(requests, [{ owner: "dome", points: wall }], [panel]);
    for (const l of labels) {
      expect(segmentHitsBox(l.box, wall[0]!, wall[1]!, wall[2]!, wall[3]!)).toBe(false);
      expect(corners(l.box).every(([x]) => x > 60)).toBe(true);
    }
    expect(labels.length).toBe(8);
  });

  it("reports a line too short for its label instead of forcing one on it", () => {
    const { labels, report } = run([request("short", "−100 °C", [[50, 50, 53, 50]]), request("long", "20 °C", [[0, 80, 200, 80]])]);
    expect(labels.map((l) => l.request.owner)).toEqual(["long"]);
    expect(report.unlabelled.map((u) => u.owner)).toEqual(["short"]);
    expect(report.dropped).toBe(1);
  });

  it("follows the family's preference along a free line", () => {
    const line = [[0, 60, 200, 60]];
    const right = run([request("a", "50 °C", line, (x) => Math.min(1, Math.abs(x - 170) / 100))]).labels[0]!;
    const left = run([request("a", "50 °C", line, (x) => Math.min(1, Math.abs(x - 30) / 100))]).labels[0]!;
    expect(Math.abs(right.x - 170)).toBeLessThan(3);
    expect(Math.abs(left.x - 30)).toBeLessThan(3);
  });

  it("turns text to read upwards on a steep line and along the line elsewhere", () => {
    const [steep] = run([request("v", "10 °C", [[100, 110, 101, 10]])]).labels;
    expect(steep!.rotate).toBeGreaterThan(80);
    expect(steep!.rotate).toBeLessThan(100);
    const [slope] = run([request("d", "10 °C", [[10, 110, 190, 10]])]).labels;
    expect(slope!.rotate).toBeCloseTo((Math.atan2(100, 180) * 180) / Math.PI, 0);
  });
});
