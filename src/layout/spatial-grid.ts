// A uniform bucket grid over the page for fast "what is near this box" queries while labels are placed:
// line segments (for clutter and the dome) and placed label boxes, each tagged with an owner.

import { bounds, boxesIntersect, segmentHitsBox, type Box, type Rect } from "./geometry.js";

interface Segment {
  owner: string;
  x1: number;
  y1: number;
  x2: number;
  y2: number;
}

interface Placed {
  owner: string;
  box: Box;
}

export class SpatialGrid {
  private readonly cells = new Map<number, { segments: Segment[]; boxes: Placed[] }>();

  constructor(private readonly cell: number) {}

  private key(i: number, j: number): number {
    return (i + 4096) * 8192 + (j + 4096);
  }

  private bucket(i: number, j: number): { segments: Segment[]; boxes: Placed[] } {
    const k = this.key(i, j);
    let b = this.cells.get(k);
    if (!b) {
      b = { segments: [], boxes: [] };
      this.cells.set(k, b);
    }
    return b;
  }

  private range(r: Rect): [number, number, number, number] {
    const c = this.cell;
    return [Math.floor(r.x / c), Math.floor(r.y / c), Math.floor((r.x + r.width) / c), Math.floor((r.y + r.height) / c)];
  }

  addPolyline(owner: string, points: number[]): void {
    for (let i = 0; i + 3 < points.length; i += 2) {
      const s = { owner, x1: points[i]!, y1: points[i + 1]!, x2: points[i + 2]!, y2: points[i + 3]! };
      const [i0, j0, i1, j1] = this.range({ x: Math.min(s.x1, s.x2), y: Math.min(s.y1, s.y2), width: Math.abs(s.x2 - s.x1), height: Math.abs(s.y2 - s.y1) });
      for (let i2 = i0; i2 <= i1; i2++) for (let j2 = j0; j2 <= j1; j2++) this.bucket(i2, j2).segments.push(s);
    }
  }

  addBox(owner: string, box: Box): void {
    const [i0, j0, i1, j1] = this.range(bounds(box));
    for (let i = i0; i <= i1; i++) for (let j = j0; j <= j1; j++) this.bucket(i, j).boxes.push({ owner, box });
  }

  private visit(box: Box, each: (b: { segments: Segment[]; boxes: Placed[] }) => boolean): void {
    const [i0, j0, i1, j1] = this.range(bounds(box));
    for (let i = i0; i <= i1; i++)
      for (let j = j0; j <= j1; j++) {
        const b = this.cells.get(this.key(i, j));
        if (b && each(b)) return;
      }
  }

  /** Owners (other than `except`) of segments that enter the box, each counted once. */
  segmentOwners(box: Box, except?: string): Set<string> {
    const owners = new Set<string>();
    this.visit(box, (b) => {
      for (const s of b.segments) if (s.owner !== except && !owners.has(s.owner) && segmentHitsBox(box, s.x1, s.y1, s.x2, s.y2)) owners.add(s.owner);
      return false;
    });
    return owners;
  }

  /** Whether any segment of the listed owners enters the box. */
  hitsOwners(box: Box, owners: ReadonlySet<string>, except?: string): boolean {
    let hit = false;
    this.visit(box, (b) => {
      hit = b.segments.some((s) => s.owner !== except && owners.has(s.owner) && segmentHitsBox(box, s.x1, s.y1, s.x2, s.y2));
      return hit;
    });
    return hit;
  }

  /** Whether any stored box intersects this one. */
  hitsBox(box: Box): boolean {
    let hit = false;
    this.visit(box, (b) => {
      hit = b.boxes.some((p) => boxesIntersect(p.box, box));
      return hit;
    });
    return hit;
  }

  /** How many stored boxes (each counted once) intersect this one. */
  countBoxes(box: Box): number {
    const seen = new Set<Box>();
    this.visit(box, (b) => {
      for (const p of b.boxes) if (!seen.has(p.box) && boxesIntersect(p.box, box)) seen.add(p.box);
      return false;
    });
    return seen.size;
  }
}
