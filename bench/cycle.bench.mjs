// Cycle benchmark (run against dist/ after `npm run build`): ms per cycle for each model, including
// its drawn path, and for the transcritical high-pressure search, in process CPU time, best of 3.
import { cpuTimePerCall } from "./clock.mjs";
import { optimiseHighPressure, singleStageCycle, transcriticalCycle, twoStageCycle, cycleOverlay, parseReadings, evaluateReadings } from "../dist/cycle/index.js";

const time = (fn) => cpuTimePerCall(fn, { minMs: 300 });

const C = (t) => t + 273.15;
const readings = "name,p [bar],T [C],expect\n" + Array.from({ length: 100 }, (_, i) => `r${i},${2 + i * 0.1},${10 + i * 0.5},vapour`).join("\n");
const cases = [
  ["single-stage R134a", () => singleStageCycle({ fluid: "R134a", evaporating: { T: C(-10) }, condensing: { T: C(40) }, superheat: 5, subcooling: 3, compressor: { efficiency: 0.7 } })],
  ["single-stage R407C, IHX, drops", () => singleStageCycle({ fluid: "R407C", evaporating: { T: C(0) }, condensing: { T: C(45) }, glidePoint: "mid", superheat: 5, ihx: 0.6, suctionDrop: 2e4, dischargeDrop: 3e4, compressor: { efficiency: 0.65 } })],
  ["two-stage ammonia, flash tank", () => twoStageCycle({ fluid: "ammonia", evaporating: { T: C(-35) }, condensing: { T: C(35) }, arrangement: "flash-tank", lowStage: { efficiency: 0.7 }, highStage: { efficiency: 0.7 } })],
  ["two-stage R404A, economiser", () => twoStageCycle({ fluid: "R404A", evaporating: { T: C(-40) }, condensing: { T: C(40) }, arrangement: "economiser", lowStage: { efficiency: 0.65 }, highStage: { efficiency: 0.7 } })],
  ["transcritical co2 at 90 bar", () => transcriticalCycle({ fluid: "co2", evaporating: { T: C(-5) }, gasCoolerOutlet: C(35), highPressure: 90e5, compressor: { efficiency: 0.7 } })],
  ["transcritical co2, optimised", () => optimiseHighPressure({ fluid: "co2", evaporating: { T: C(-5) }, gasCoolerOutlet: C(35), compressor: { efficiency: 0.7 } })],
  ["overlay of a single-stage cycle", (() => { const r = singleStageCycle({ fluid: "R134a", evaporating: { T: C(-10) }, condensing: { T: C(40) }, compressor: { efficiency: 0.7 } }); return () => cycleOverlay(r, "si"); })()],
  ["100 readings, R134a", () => evaluateReadings("R134a", parseReadings(readings))],
];

for (const [name, fn] of cases) console.log(`${name.padEnd(34)} ${time(fn).toFixed(3).padStart(9)} ms`);
