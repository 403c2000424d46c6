// What the layout engine draws for a cycle or a set of readings: states placed by (h, p), with the
// tables that go beside them. Built by src/cycle from the property engine; drawn by src/layout, which
// never calls the engine itself.

export interface OverlayPoint {
  /** Label printed at the marker: a point number ("1", "2s") or a reading's name. */
  label: string;
  /** Specific enthalpy [J/kg] in the sheet's reference state, and absolute pressure [Pa]. */
  h: number;
  p: number;
  /** Optional note for the state table (e.g. "superheat 5.0 K", or a plausibility flag). */
  note?: string;
  /** True when a plausibility check flagged this reading. */
  flagged?: boolean;
}

export interface OverlayTable {
  title: string;
  /** Header row then data rows, already formatted in the sheet's display units. */
  columns: string[];
  rows: string[][];
}

export interface Overlay {
  /** Legend text, e.g. "design: −10 °C / 40 °C" or "measured 2026-11-03". */
  name: string;
  kind: "cycle" | "points";
  /** Path through the points in order; closed for a cycle. Segments may be refined with intermediate states. */
  path: { h: number; p: number }[];
  closed: boolean;
  /** Optional open paths of side streams (a flash tank's vapour, an economiser's injection), drawn like the path. */
  branches?: { h: number; p: number }[][];
  points: OverlayPoint[];
  /** State table and performance panel (cycles), or the readings table (points). */
  tables: OverlayTable[];
}
