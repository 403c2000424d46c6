// Measured readings as the layout engine draws them: a marker per reading at its (h, p), flagged
// readings marked, the path through them in file order, and the readings table in display units.
import { formatter, type DisplayUnits, type Formatter } from "./display-units.js";
import type { Overlay, OverlayPoint, OverlayTable } from "./overlay.js";
import type { EvaluatedReading, Flag, ReadingsResult } from "./readings.js";

/** A flag in words, its limit in display units. */
export function flagText(fmt: Formatter, flag: Flag): string {
  switch (flag.kind) {
    case "above-critical": return `at or above the critical pressure ${fmt.withUnit("pressure", flag.limit)}: not a subcritical reading`;
    case "not-supercritical": return `not above the critical pressure ${fmt.withUnit("pressure", flag.limit)}: not a supercritical reading`;
    case "below-dew": return `colder than the dew point ${fmt.withUnit("temperature", flag.limit)}: not superheated vapour (liquid in the line, or a faulty sensor)`;
    case "above-bubble": return `warmer than the bubble point ${fmt.withUnit("temperature", flag.limit)}: not subcooled liquid (flash gas, or a faulty sensor)`;
    case "out-of-range": return `outside the equation's range: ${flag.message}`;
  }
}

function marginText(fmt: Formatter, r: EvaluatedReading): string {
  if (r.superheat !== undefined && r.superheat > 0) return `superheat ${fmt.withUnit("difference", r.superheat)}`;
  if (r.subcooling !== undefined && r.subcooling > 0) return `subcooling ${fmt.withUnit("difference", r.subcooling)}`;
  return r.state?.phase === "two-phase" ? "inside the glide" : "";
}

function saturationText(fmt: Formatter, r: EvaluatedReading): string {
  if (r.dew === undefined || r.bubble === undefined) return "";
  if (Math.abs(r.dew - r.bubble) < 1e-9) return fmt.number("temperature", r.dew);
  return `${fmt.number("temperature", r.bubble)} / ${fmt.number("temperature", r.dew)}`;
}

export function readingsTable(res: ReadingsResult, units: DisplayUnits, typographic = false): OverlayTable {
  const fmt = formatter(units, typographic);
  const columns = ["name", "as read", `p [${fmt.symbol("pressure")}]`, `T [${fmt.symbol("temperature")}]`, `T sat [${fmt.symbol("temperature")}]`, "phase", "margin",
    `h [${fmt.symbol("enthalpy")}]`, `s [${fmt.symbol("entropy")}]`, "flags"];
  const rows = res.readings.map((r) => [
    r.name, `${r.pText}, ${r.TText}`, fmt.number("pressure", r.p), fmt.number("temperature", r.T), saturationText(fmt, r), r.state?.phase ?? "—", marginText(fmt, r),
    r.state ? fmt.number("enthalpy", r.state.h) : "—", r.state ? fmt.number("entropy", r.state.s) : "—", r.flags.map((x) => flagText(fmt, x)).join("; "),
  ]);
  return { title: res.title ?? `readings from ${res.source}`, columns, rows };
}

function overlayPoint(fmt: Formatter, r: EvaluatedReading & { state: NonNullable<EvaluatedReading["state"]> }): OverlayPoint {
  const pt: OverlayPoint = { label: r.name, h: r.state.h, p: r.state.p };
  const notes = [marginText(fmt, r), ...r.flags.map((x) => flagText(fmt, x))].filter(Boolean);
  if (notes.length) pt.note = notes.join("; ");
  if (r.flags.length) pt.flagged = true;
  return pt;
}

/** The overlay of evaluated readings; readings outside the equation's range appear in the table only. */
export function readingsOverlay(res: ReadingsResult, displayUnits: DisplayUnits, name?: string): Overlay {
  const fmt = formatter(displayUnits, true);
  const placed = res.readings.filter((r): r is EvaluatedReading & { state: NonNullable<EvaluatedReading["state"]> } => r.state !== undefined);
  return {
    name: name ?? res.title ?? `${res.fluid} readings`,
    kind: "points",
    path: placed.map((r) => ({ h: r.state.h, p: r.state.p })),
    closed: false,
    points: placed.map((r) => overlayPoint(fmt, r)),
    tables: [readingsTable(res, displayUnits, true)],
  };
}
