// The cautions a sheet carries for its fluid: the usual ones for its ISO 817 safety class (flammability,
// toxicity), the high pressures of carbon dioxide, and the line that defers to codes and licensed practice.

import type { FluidIdentity } from "./content.js";

export interface Caution {
  text: string;
  /** Printed in bold: the cautions a reader must not miss. */
  strong?: boolean;
}

/** Flammability digit of an ISO 817 class ("A2L" → "2L", "B1" → "1"). */
function flammability(safetyClass: string): string {
  return safetyClass.slice(1);
}

function toxicity(safetyClass: string): "A" | "B" | undefined {
  const letter = safetyClass[0];
  return letter === "A" || letter === "B" ? letter : undefined;
}

const FLAMMABLE: Record<string, Caution[]> = {
  "2L": [
    { text: "Flammable (class 2L, lower burning velocity): keep ignition sources away from the refrigerant and from any place a leak can collect.", strong: true },
    { text: "Respect the charge limits for the occupied space and the equipment; use tools, detectors and recovery units rated for flammable refrigerants." },
  ],
  "2": [
    { text: "Flammable (class 2): keep ignition sources away; no open flames, sparks or hot surfaces near the system or where a leak can collect.", strong: true },
    { text: "Respect the charge limits for the space and the equipment; ventilate, and use tools and recovery units rated for flammable refrigerants." },
  ],
  "3": [
    { text: "Highly flammable (class 3): keep all ignition sources away; a small leak can form an explosive mixture with air.", strong: true },
    { text: "Small charge limits apply; work only with ventilation, gas detection and tools, recovery units and cylinders rated for flammable refrigerants." },
  ],
};

const HIGHER_TOXICITY: Caution[] = [
  { text: "Higher toxicity (class B): exposure to low concentrations can cause injury; use leak detection with alarms, emergency ventilation and respiratory protection as required.", strong: true },
];

const AMMONIA: Caution[] = [{ text: "Ammonia is corrosive to eyes, skin and lungs and reacts with copper and its alloys; keep emergency eye-wash and water at hand." }];

const CARBON_DIOXIDE: Caution[] = [
  { text: "R-744 works at very high pressures: standstill pressure can exceed the design pressure of low-side parts; check every component's rating.", strong: true },
  { text: "Never trap liquid between closed valves (thermal expansion bursts pipes); venting liquid below 5.2 bar forms dry ice that can block lines and valves." },
  { text: "Carbon dioxide displaces oxygen and is harmful at high concentrations: detect and ventilate low rooms and pits." },
];

const LOWER_TOXICITY: Caution[] = [{ text: "Lower toxicity (class A), but any leak displaces oxygen: ventilate, and take care in pits, basements and small rooms." }];

const GENERAL: Caution[] = [
  { text: "Liquid and cold vapour cause cold burns: wear gloves and eye protection when connecting or venting." },
  { text: "Hot surfaces and flames can decompose the refrigerant into harmful products." },
];

const UNCLASSIFIED: Caution[] = [{ text: "No ISO 817 safety class is recorded for this fluid here: consult its safety data sheet before any work.", strong: true }];

/** Always last: where authority lies, and what the figures are for. */
export const DEFERRAL: Caution = {
  text: "This sheet is a reading aid. Check values against the equipment's documentation; design, installation and service follow local codes and standards and are for licensed, competent practitioners.",
  strong: true,
};

export function cautionsFor(fluid: FluidIdentity): Caution[] {
  const out: Caution[] = [];
  const safety = fluid.safetyClass;
  if (safety === null) out.push(...UNCLASSIFIED);
  else {
    if (toxicity(safety) === "B") out.push(...HIGHER_TOXICITY);
    out.push(...(FLAMMABLE[flammability(safety)] ?? []));
    if (toxicity(safety) === "A" && flammability(safety) === "1") out.push(...LOWER_TOXICITY);
  }
  if (fluid.designation === "R-717") out.push(...AMMONIA);
  if (fluid.designation === "R-744") out.push(...CARBON_DIOXIDE);
  if (fluid.safetyNote) out.push({ text: fluid.safetyNote });
  out.push(...GENERAL, DEFERRAL);
  return out;
}
