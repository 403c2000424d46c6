// A computed cycle as the layout engine draws it: the refined closed path, side-stream branches,
// numbered points with their superheat or subcooling, and the tables in the sheet's display units.
import { formatter, type DisplayUnits } from "./display-units.js";
import { cycleTables } from "./cycle-tables.js";
import type { Overlay, OverlayPoint } from "./overlay.js";
import type { CyclePoint } from "./point.js";
import type { CycleResult } from "./result.js";

function legend(r: CycleResult, units: DisplayUnits): string {
  const fmt = formatter(units, true);
  const low = fmt.withUnit("temperature", r.levels.evaporating.dew);
  const high = r.levels.condensing
    ? fmt.withUnit("temperature", r.levels.condensing.dew)
    : `${fmt.withUnit("pressure", r.highSide!.pressure)}, ${fmt.withUnit("temperature", r.highSide!.gasCoolerOutlet)}`;
  return `${r.fluid} cycle: ${low} / ${high}${r.blend ? " (dew points)" : ""}`;
}

function overlayPoint(pt: CyclePoint, units: DisplayUnits): OverlayPoint {
  const fmt = formatter(units, true);
  const out: OverlayPoint = { label: pt.label, h: pt.state.h, p: pt.state.p };
  if (pt.superheat !== undefined && pt.superheat > 0) out.note = `superheat ${fmt.withUnit("difference", pt.superheat)}`;
  else if (pt.subcooling !== undefined && pt.subcooling > 0) out.note = `subcooling ${fmt.withUnit("difference", pt.subcooling)}`;
  return out;
}

/** The overlay of a cycle; `name` replaces the default legend ("R134a cycle: −10.0 °C / 40.0 °C"). */
export function cycleOverlay(result: CycleResult, displayUnits: DisplayUnits, name?: string): Overlay {
  const overlay: Overlay = {
    name: name ?? legend(result, displayUnits),
    kind: "cycle",
    path: result.path.map(({ h, p }) => ({ h, p })),
    closed: true,
    points: result.points.map((pt) => overlayPoint(pt, displayUnits)),
    tables: cycleTables(result, displayUnits, true),
  };
  if (result.branches.length) overlay.branches = result.branches.map((b) => b.map(({ h, p }) => ({ h, p })));
  return overlay;
}
