// The tables printed beside a cycle, already formatted in display units: the conditions it was
// computed under (glide points stated), its numbered states, and its performance.
import type { OverlayTable } from "./overlay.js";
import { formatter, type DisplayUnits, type Formatter } from "./display-units.js";
import type { ResolvedLevel } from "./level.js";
import { describeRoles, type CyclePoint } from "./point.js";
import { MODEL_TEXT, type CycleResult } from "./result.js";

const GLIDE_TEXT = { dew: "dew point", bubble: "bubble point", mid: "mid-point of the glide" } as const;

/** How a level was given and what it resolved to; a blend's glide point is always named. */
export function levelRow(fmt: Formatter, l: ResolvedLevel, pseudoPure: boolean): string {
  const p = fmt.withUnit("pressure", l.p);
  const sat = pseudoPure
    ? `dew ${fmt.withUnit("temperature", l.dew)}, bubble ${fmt.withUnit("temperature", l.bubble)}`
    : `saturation ${fmt.withUnit("temperature", l.dew)}`;
  if ("T" in l.given) {
    const T = fmt.withUnit("temperature", l.given.T);
    // Written with "at" rather than an arrow: the sheet's typeface has no arrow glyph.
    return pseudoPure ? `${T} at the ${GLIDE_TEXT[l.glidePoint!]}, at ${p} (${sat})` : `${T} at ${p}`;
  }
  return `${p}, given as a pressure (${sat})`;
}

function marginText(fmt: Formatter, pt: CyclePoint): string {
  if (pt.superheat !== undefined && pt.superheat > 0) return `superheat ${fmt.withUnit("difference", pt.superheat)}`;
  if (pt.subcooling !== undefined && pt.subcooling > 0) return `subcooling ${fmt.withUnit("difference", pt.subcooling)}`;
  return "";
}

export function conditionsTable(r: CycleResult, fmt: Formatter): OverlayTable {
  const pseudoPure = r.blend;
  const rows: string[][] = [["model", MODEL_TEXT[r.model]], ["fluid", `${r.fluid}, reference state ${r.reference}`]];
  rows.push(["evaporating", levelRow(fmt, r.levels.evaporating, pseudoPure)]);
  const mid = r.levels.intermediate;
  if (mid) {
    const text = mid.source === "geometric-mean"
      ? `${fmt.withUnit("pressure", mid.p)}, geometric mean of the evaporating and condensing pressures (${pseudoPure ? `dew ${fmt.withUnit("temperature", mid.dew)}, bubble ${fmt.withUnit("temperature", mid.bubble)}` : `saturation ${fmt.withUnit("temperature", mid.dew)}`})`
      : levelRow(fmt, mid, pseudoPure);
    rows.push(["intermediate", text]);
  }
  if (r.levels.condensing) rows.push(["condensing", levelRow(fmt, r.levels.condensing, pseudoPure)]);
  if (r.highSide) rows.push(["high side", `${fmt.withUnit("pressure", r.highSide.pressure)}, gas-cooler outlet ${fmt.withUnit("temperature", r.highSide.gasCoolerOutlet)}`]);
  rows.push(["superheat", `${fmt.withUnit("difference", r.superheat)} at the evaporator outlet`]);
  if (r.subcooling !== undefined) rows.push(["subcooling", `${fmt.withUnit("difference", r.subcooling)} at the condenser outlet`]);
  if (r.drops.suction > 0 || r.drops.discharge > 0) rows.push(["line drops", `suction ${fmt.withUnit("pressure", r.drops.suction)}, discharge ${fmt.withUnit("pressure", r.drops.discharge)}`]);
  if (r.ihx) rows.push(["internal heat exchanger", `effectiveness ${fmt.plain(r.ihx.effectiveness, 3)}, duty ${fmt.withUnit("enthalpy", r.ihx.duty)}`]);
  if (r.economiserApproach !== undefined) rows.push(["economiser approach", fmt.withUnit("difference", r.economiserApproach)]);
  for (const n of r.notes) rows.push(["assumed", n]);
  return { title: "conditions", columns: ["", ""], rows };
}

export function statesTable(r: CycleResult, fmt: Formatter): OverlayTable {
  const all = [...r.points, ...r.auxiliary];
  const showFlow = all.some((p) => Math.abs(p.flow - 1) > 1e-12);
  const columns = ["pt", "where", `p [${fmt.symbol("pressure")}]`, `T [${fmt.symbol("temperature")}]`, `h [${fmt.symbol("enthalpy")}]`, `s [${fmt.symbol("entropy")}]`, "x / phase", "margin"];
  if (showFlow) columns.push("flow");
  const rows = all.map((pt) => {
    const st = pt.state;
    const row = [pt.label, describeRoles(pt.roles), fmt.number("pressure", st.p), fmt.number("temperature", st.T), fmt.number("enthalpy", st.h), fmt.number("entropy", st.s),
      st.x === null ? st.phase : fmt.plain(st.x, 3), marginText(fmt, pt)];
    if (showFlow) row.push(fmt.plain(pt.flow, 4));
    return row;
  });
  return { title: "states", columns, rows };
}

export function performanceTable(r: CycleResult, fmt: Formatter): OverlayTable {
  const p = r.performance;
  const two = r.stages.length > 1;
  const rows: string[][] = [
    ["refrigerating effect", fmt.withUnit("enthalpy", p.refrigeratingEffect)],
    ["compressor work", fmt.withUnit("enthalpy", p.compressorWork)],
  ];
  if (two) r.stages.forEach((s, i) => rows.push([`  ${s.name}`, fmt.withUnit("enthalpy", p.stageWork[i]!)]));
  rows.push(
    ["heat rejected", fmt.withUnit("enthalpy", p.heatRejected)],
    ["COP cooling", fmt.plain(p.copCooling, 3)],
    ["COP heating", fmt.plain(p.copHeating, 3)],
    ["pressure ratio", fmt.plain(p.pressureRatio, 2)],
  );
  for (const s of r.stages) {
    const label = two ? ` (${s.name})` : "";
    if (two) rows.push([`pressure ratio${label}`, fmt.plain(s.discharge.state.p / s.suction.state.p, 2)]);
    rows.push([`discharge temperature${label}`, fmt.withUnit("temperature", s.discharge.state.T)]);
    rows.push([`isentropic efficiency${label}`, fmt.plain(s.efficiency, 3)]);
  }
  rows.push(["volumetric refrigerating capacity", fmt.withUnit("volumetricCapacity", p.volumetricCapacity)]);
  if (r.optimum) {
    rows.push(["optimum high-side pressure", `${fmt.withUnit("pressure", r.optimum.pressure)}${r.optimum.atBound ? " (on a search bound)" : ""}`]);
    rows.push(["  searched", `${fmt.withUnit("pressure", r.optimum.bounds[0])} to ${fmt.withUnit("pressure", r.optimum.bounds[1])}, ${r.optimum.evaluations} cycles`]);
  }
  const c = p.capacity;
  if (c) {
    rows.push(["cooling capacity", fmt.withUnit("power", c.cooling)], ["heat rejection", fmt.withUnit("power", c.heatRejected)], ["compressor power", fmt.withUnit("power", c.power)]);
    rows.push(["mass flow, evaporator", fmt.withUnit("massFlow", c.evaporatorMassFlow)]);
    if (two) rows.push(["mass flow, condenser", fmt.withUnit("massFlow", c.rejectionMassFlow)]);
    for (const s of c.stages) rows.push([`suction volume flow${two ? ` (${s.name})` : ""}`, fmt.withUnit("volumeFlow", s.suctionVolumeFlow)]);
  }
  return { title: "performance (per kg through the evaporator)", columns: ["", ""], rows };
}

/** All three tables of a cycle in a unit system. */
export function cycleTables(r: CycleResult, units: DisplayUnits, typographic = false): OverlayTable[] {
  const fmt = formatter(units, typographic);
  return [conditionsTable(r, fmt), statesTable(r, fmt), performanceTable(r, fmt)];
}
