// Carries the numbers of the shared equation-of-state data into domeprint's own fluid format.
// Run once when the shared data changes: node scripts/import-eos-data.mjs [path/to/eos-data]
import { readFileSync, readdirSync, writeFileSync, renameSync } from "node:fs";
import { join, resolve } from "node:path";
import { citations, chemistry } from "./fluid-metadata.mjs";

const src = resolve(process.argv[2] ?? "../shared/eos-data");
const dest = resolve("fluids");

const idealKinds = {
  lead: (t) => ({ type: "lead", a1: t.a1, a2: t.a2 }),
  offset: (t) => ({ type: "offset", a1: t.a1, a2: t.a2 }),
  log_tau: (t) => ({ type: "log-tau", a: t.a }),
  tau_power: (t) => ({ type: "tau-power", columns: ["n", "t"], rows: zip(t.n, t.t) }),
  planck_einstein: (t) => ({ type: "planck-einstein", columns: ["n", "theta"], rows: zip(t.n, t.theta) }),
  planck_einstein_kelvin: (t) => ({ type: "planck-einstein-kelvin", columns: ["n", "theta_K"], rows: zip(t.n, t.theta_K) }),
  planck_einstein_general: (t) => ({ type: "planck-einstein-general", columns: ["n", "c", "d", "theta"], rows: zip(t.n, t.c, t.d, t.theta) }),
  cp0_power: (t) => ({ type: "cp0-power", T0: t.T0_K, columns: ["c", "t"], rows: zip(t.c, t.t) }),
};

const residualKinds = {
  power: (t) => ({ type: "power", columns: ["n", "t", "d", "l"], rows: zip(t.n, t.t, t.d, t.l) }),
  gaussian: (t) => ({ type: "gaussian", columns: ["n", "t", "d", "eta", "epsilon", "beta", "gamma"], rows: zip(t.n, t.t, t.d, t.eta, t.epsilon, t.beta, t.gamma) }),
  gaussian_rational: (t) => ({ type: "gaussian-rational", columns: ["n", "t", "d", "eta", "epsilon", "beta", "gamma", "b"], rows: zip(t.n, t.t, t.d, t.eta, t.epsilon, t.beta, t.gamma, t.b) }),
  power_double_exp: (t) => ({ type: "power-double-exp", columns: ["n", "t", "d", "l", "m"], rows: zip(t.n, t.t, t.d, t.l, t.m) }),
  nonanalytic: (t) => ({ type: "nonanalytic", columns: ["n", "a", "b", "beta", "A", "B", "C", "D"], rows: zip(t.n, t.a, t.b, t.beta, t.A, t.B, t.C, t.D) }),
};

const ancillaryNames = { p_sat: "pSat", p_bubble: "pBubble", p_dew: "pDew", rho_liquid: "rhoLiquid", rho_vapor: "rhoVapour" };
const ancillaryForms = { linear: "linear", exp: "exp", exp_reduced: "exp-reduced" };

function zip(...cols) {
  const n = cols[0].length;
  for (const c of cols) if (c.length !== n) throw new Error("column lengths differ");
  return Array.from({ length: n }, (_, i) => cols.map((c) => c[i]));
}

function convert(d) {
  const chem = chemistry[d.id];
  if (!chem) throw new Error(`no chemistry entry for ${d.id}`);
  const cite = citations[d.equation.citation_key];
  if (!cite) throw new Error(`no citation for ${d.equation.citation_key}`);
  const [chemicalName, formula, classOverride, classNote] = chem;
  const safetyClass = d.safety_group ?? classOverride ?? null;
  const seen = new Set();
  const aliases = [d.designation, d.designation.replace("-", ""), d.name, chemicalName, ...d.aliases]
    .filter((a) => {
      const k = a.toLowerCase();
      if (k === d.id.toLowerCase() || seen.has(k)) return false;
      seen.add(k);
      return true;
    });
  const anc = {};
  for (const [k, a] of Object.entries(d.ancillaries)) {
    anc[ancillaryNames[k]] = {
      form: ancillaryForms[a.form], Tr: a.T_reducing_K, valueR: a.value_reducing,
      columns: ["n", "t"], rows: zip(a.n, a.t), Tmin: a.T_min_K, Tmax: a.T_max_K,
      maxErrorPercent: a.max_error_percent,
    };
  }
  const st = (s) => ({ T: s.T_K, p: s.p_Pa, rho: s.rho_mol_m3, h: s.h_J_mol, s: s.s_J_molK });
  return {
    format: "domeprint-fluid/1",
    units: "molar SI: K, Pa, mol/m3, J/mol, J/(mol K); molar mass in kg/mol",
    id: d.id,
    designation: d.designation,
    chemicalName,
    formula,
    aliases,
    cas: /^\d+-\d+-\d$/.test(d.cas) ? d.cas : null,
    safety: {
      class: safetyClass,
      source: d.safety_group ? d.safety_group_source : classOverride ? "from memory (ISO 817 / ASHRAE 34); verify against the current edition" : "none recorded",
      ...(classNote ? { note: classNote } : {}),
    },
    pseudoPure: d.pseudo_pure,
    molarMass: d.molar_mass_kg_mol,
    gasConstant: d.gas_constant_J_molK,
    reducing: { T: d.reducing.T_K, rho: d.reducing.rho_mol_m3 },
    critical: { T: d.critical.T_K, p: d.critical.p_Pa, rho: d.critical.rho_mol_m3 },
    triple: { T: d.triple.T_K, pLiquid: d.triple.p_liquid_Pa, pVapour: d.triple.p_vapor_Pa, rhoLiquid: d.triple.rho_liquid_mol_m3, rhoVapour: d.triple.rho_vapor_mol_m3 },
    validity: { Tmin: d.triple.T_K, Tmax: d.limits.T_max_K, pmax: d.limits.p_max_Pa },
    equation: {
      ...cite,
      citationSource: "written from memory by the project; check spelling, volume and pages against the journal",
    },
    ideal: d.ideal.map((t) => idealKinds[t.form](t)),
    residual: d.residual.map((t) => residualKinds[t.form](t)),
    ancillaries: anc,
    transcriptionAnchors: {
      note: "states computed by the compilers of the coefficient dataset: they catch a transcription slip and are not an independent reference",
      ...Object.fromEntries(Object.entries(d.dataset_states).map(([k, s]) => [k, st(s)])),
    },
  };
}

/** JSON with two-space indent, but arrays of plain values (term rows, columns) kept on one line. */
function stringify(value, indent = "") {
  if (Array.isArray(value)) {
    if (value.every((v) => v === null || typeof v !== "object")) return `[${value.map((v) => JSON.stringify(v)).join(", ")}]`;
    const inner = indent + "  ";
    return `[\n${value.map((v) => inner + stringify(v, inner)).join(",\n")}\n${indent}]`;
  }
  if (value && typeof value === "object") {
    const inner = indent + "  ";
    const entries = Object.entries(value).map(([k, v]) => `${inner}${JSON.stringify(k)}: ${stringify(v, inner)}`);
    return `{\n${entries.join(",\n")}\n${indent}}`;
  }
  return JSON.stringify(value);
}

let count = 0;
for (const f of readdirSync(join(src, "fluids")).sort()) {
  if (!f.endsWith(".json")) continue;
  const d = JSON.parse(readFileSync(join(src, "fluids", f), "utf8"));
  const out = convert(d);
  const path = join(dest, `${d.id}.json`);
  writeFileSync(path + ".tmp", stringify(out) + "\n");
  renameSync(path + ".tmp", path);
  count++;
}
console.log(`wrote ${count} fluid files into ${dest}`);
