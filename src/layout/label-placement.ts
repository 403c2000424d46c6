// The label placement optimiser: for each line, candidates along it scored by where the eye looks, how
// crowded the spot is and how well it lines up with its family; chosen greedily, never overlapping.

import type { FontWeight } from "../render/fonts.js";
import { runMetrics } from "./font-metrics.js";
import { boxInside, grow, type Box, type Rect } from "./geometry.js";
import { labelCandidates, type Candidate } from "./label-candidates.js";
import { SpatialGrid } from "./spatial-grid.js";

export interface LabelRequest {
  /** The line's id: its own segments never count against its label. */
  owner: string;
  family: string;
  text: string;
  sizePt: number;
  weight: FontWeight;
  /** Page polylines of the line, already cut to the plot frame. */
  pieces: number[][];
  /** Lines are served in this order (lower first): the dome before the isolines. */
  priority: number;
  /** Labels wanted on this line; the first is required, the rest where room allows. */
  wanted: number;
  /** Where a reader looks for this family's labels: 0 best … 1 worst, from page mm. */
  prefer: (x: number, y: number) => number;
  /** Labels of a family line up across their lines: in a row (same height) or a column (same x). */
  align: "row" | "column";
  /** Set the label this far (mm) beside its line instead of on it, so the line stays unbroken. */
  beside?: number;
  /** Written on the label's mark (e.g. the line's quantity and SI value), so a reader can pair them. */
  data?: Record<string, string>;
}

export interface PlacedLabel {
  request: LabelRequest;
  x: number;
  y: number;
  rotate: number;
  box: Box;
}

export interface PlacementReport {
  /** Labels placed in all. */
  placed: number;
  /** Labels wanted but not placed (further labels on long lines included). */
  dropped: number;
  /** Lines that got no label at all, even with relaxed rules; the sheet leaves them out. */
  unlabelled: { owner: string; text: string }[];
}

export interface PlacementInput {
  requests: LabelRequest[];
  /** The plot frame: labels stay inside it. */
  region: Rect;
  /** Clearance kept from the frame, in mm. */
  inset: number;
  /** Least gap between two labels' boxes, in mm. */
  clearance: number;
  /** Every drawn line, for crowding. */
  lines: SpatialGrid;
  /** Lines no label may cross (the dome, cycles) and boxes no label may overlap (panels, markers). */
  obstacles: SpatialGrid;
  /** Owners in `obstacles` whose segments labels must avoid. */
  hardOwners: ReadonlySet<string>;
  halo: number;
}

/** Candidate spacing along a line as a share of the type's cap height: fine enough to find gaps, coarse enough to stay fast. */
const STEP_PER_CAP = 1;

const WEIGHT = { prefer: 4, crowding: 0.6, alignment: 1.2, steep: 0.5, spacing: 0.5 } as const;

/** Labels within this many label heights of a candidate count against it, so labels spread out. */
const SPACING_HEIGHTS = 3;

interface Scored {
  candidate: Candidate;
  score: number;
}

function shapeOf(request: LabelRequest, halo: number) {
  const metrics = runMetrics(request.text, request.sizePt, request.weight);
  return { ...metrics, pad: halo };
}

export class LabelPlacer {
  private readonly placed: PlacedLabel[] = [];
  private readonly boxes: SpatialGrid;
  private readonly familyAnchors = new Map<string, number[]>();

  constructor(private readonly input: PlacementInput) {
    this.boxes = new SpatialGrid(10);
  }

  /** Relaxed rules (second pass) halve the clearances to the frame and to other labels. */
  private relax = 1;

  private feasible(c: Candidate, request: LabelRequest): boolean {
    const { input } = this;
    if (!boxInside(c.box, input.region, input.inset * this.relax)) return false;
    if (this.boxes.hitsBox(grow(c.box, input.clearance * this.relax))) return false;
    if (input.obstacles.hitsBox(c.box)) return false;
    // A label set beside its own line must not touch it either; one on its line sits on it by design.
    return !input.obstacles.hitsOwners(c.box, input.hardOwners, request.beside ? undefined : request.owner);
  }

  /** The score without crowding: cheap, and a lower bound of the full score. */
  private baseScore(c: Candidate, request: LabelRequest): number {
    const { input } = this;
    const anchors = this.familyAnchors.get(request.family) ?? [];
    const along = request.align === "row" ? c.y : c.x;
    const span = request.align === "row" ? input.region.height : input.region.width;
    let nearest = Infinity;
    for (const a of anchors) nearest = Math.min(nearest, Math.abs(a - along));
    const alignment = anchors.length === 0 ? 0 : nearest / span;
    const steep = Math.max(0, Math.abs(c.rotate) - 60) / 30;
    return WEIGHT.prefer * request.prefer(c.x, c.y) + WEIGHT.alignment * Math.min(alignment * 4, 1) + WEIGHT.steep * steep;
  }

  /** Lines crossing the spot, and labels already near it: both make a label harder to find and read. */
  private crowding(c: Candidate, request: LabelRequest): number {
    const lines = Math.min(this.input.lines.segmentOwners(c.box, request.owner).size, 6);
    const near = Math.min(this.boxes.countBoxes(grow(c.box, SPACING_HEIGHTS * c.box.hh * 2)), 4);
    return WEIGHT.crowding * lines + WEIGHT.spacing * near;
  }

  /**
   * The best feasible candidate. Crowding (a grid query) is only counted for candidates whose cheaper
   * terms could still beat the best so far, and feasibility only for those that could win at all.
   */
  private best(request: LabelRequest, candidates: Candidate[]): Scored | undefined {
    let best: Scored | undefined;
    const ranked = candidates.map((candidate) => ({ candidate, base: this.baseScore(candidate, request) })).sort((a, b) => a.base - b.base);
    for (const { candidate, base } of ranked) {
      if (best && base >= best.score) break;
      if (!this.feasible(candidate, request)) continue;
      const score = base + this.crowding(candidate, request);
      if (!best || score < best.score) best = { candidate, score };
    }
    return best;
  }

  private commit(request: LabelRequest, c: Candidate): void {
    this.placed.push({ request, x: c.x, y: c.y, rotate: c.rotate, box: c.box });
    this.boxes.addBox(request.owner, c.box);
    const anchors = this.familyAnchors.get(request.family) ?? [];
    anchors.push(request.align === "row" ? c.y : c.x);
    this.familyAnchors.set(request.family, anchors);
  }

  /**
   * First every line's one required label (priority order); then, for lines still without one, a pass
   * with relaxed rules (more bend under the text, half the clearances, finer steps); then further labels
   * on long lines.
   */
  run(): { labels: PlacedLabel[]; report: PlacementReport } {
    const requests = [...this.input.requests].sort((a, b) => a.priority - b.priority);
    const candidates = new Map<LabelRequest, Candidate[]>();
    const first = new Map<LabelRequest, Candidate>();
    const shapes = new Map(requests.map((r) => [r, shapeOf(r, this.input.halo)]));
    for (const request of requests) {
      const step = STEP_PER_CAP * shapes.get(request)!.capHeight;
      const list = labelCandidates(request.pieces, shapes.get(request)!, step, request.beside ?? 0);
      candidates.set(request, list);
      const chosen = this.best(request, list);
      if (chosen) {
        this.commit(request, chosen.candidate);
        first.set(request, chosen.candidate);
      }
    }
    this.relax = 0.5;
    const unlabelled: { owner: string; text: string }[] = [];
    for (const request of requests) {
      if (first.has(request)) continue;
      const shape = shapes.get(request)!;
      const step = (STEP_PER_CAP * shape.capHeight) / 2;
      // Still no room on the line (it runs along the frame, or through a crowd): set the label just beside it.
      const chosen =
        this.best(request, labelCandidates(request.pieces, shape, step, request.beside ?? 0, 0.7)) ??
        (request.beside ? undefined : this.best({ ...request, beside: shape.pad }, labelCandidates(request.pieces, shape, step, shape.pad, 0.7)));
      if (chosen) {
        this.commit(request, chosen.candidate);
        first.set(request, chosen.candidate);
      } else unlabelled.push({ owner: request.owner, text: `${request.family} ${request.text}` });
    }
    this.relax = 1;
    let dropped = unlabelled.length;
    for (const request of requests) {
      const taken = first.get(request);
      for (let k = 1; k < request.wanted; k++) {
        if (!taken) {
          dropped++;
          continue;
        }
        const list = candidates.get(request)!;
        const mine = this.placed.filter((p) => p.request === request);
        // Further labels keep well away from this line's others, so each part of a long line gets one.
        const distance = (c: Candidate) => Math.min(...mine.map((p) => Math.hypot(p.x - c.x, p.y - c.y)));
        const far = list.filter((c) => distance(c) > 0.3 * Math.max(this.input.region.width, this.input.region.height));
        const chosen = this.best(request, far);
        if (chosen) this.commit(request, chosen.candidate);
        else dropped++;
      }
    }
    return { labels: this.placed, report: { placed: this.placed.length, dropped, unlabelled } };
  }
}

export function placeLabels(input: PlacementInput): { labels: PlacedLabel[]; report: PlacementReport } {
  return new LabelPlacer(input).run();
}
