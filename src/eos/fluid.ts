// A loaded fluid: its checked data, its Helmholtz model and ancillaries, and the constants solvers need.
// Every solver in src/eos takes a Fluid; it holds scratch arrays so hot loops allocate nothing.
import type { FluidFile } from "./fluid-file.js";
import { buildHelmholtz, type Helmholtz } from "./helmholtz.js";
import { buildAncillary, type Ancillary } from "./ancillary.js";
import { PROP_SLOTS } from "./properties.js";
import { equationCriticalPoint } from "./critical.js";

export class Fluid {
  readonly data: FluidFile;
  readonly id: string;
  readonly designation: string;
  readonly pseudoPure: boolean;
  /** Molar mass [kg/mol] and the equation's own gas constant [J/(mol K)]. */
  readonly M: number;
  readonly R: number;
  readonly Tc: number;
  readonly pc: number;
  /** Critical molar density [mol/m³]. */
  readonly rhoc: number;
  /** Lowest temperature of the equation's range: the triple point (or the blend's lower limit) [K]. */
  readonly Tmin: number;
  readonly Tmax: number;
  readonly pmax: number;
  readonly model: Helmholtz;
  readonly pSat: Ancillary | undefined;
  readonly pBubble: Ancillary | undefined;
  readonly pDew: Ancillary | undefined;
  readonly rhoLiquid: Ancillary;
  readonly rhoVapour: Ancillary;
  /** Highest temperature at which the two-phase solver is used [K]: 1 mK below the lower of the stated and the equation's own critical temperature. */
  readonly satTmax: number;
  /** The equation's own critical temperature [K] and molar density [mol/m³] (pure fluids). */
  readonly TcEquation: number;
  readonly rhocEquation: number;
  /** A saturation state 2 K below the equation's critical point, the anchor of near-critical starting values. */
  nearCriticalAnchor: { T: number; rhoL: number; rhoV: number } | undefined;
  /** Saturation pressures at Tmin and satTmax [Pa], computed at first use. */
  satPmin: number | undefined;
  satPmax: number | undefined;
  /** The equation's critical pressure [Pa], computed at first use. */
  pcEquation: number | undefined;
  /** Scratch vectors for solvers (never returned to callers). */
  readonly tmp = new Float64Array(PROP_SLOTS);
  readonly tmp2 = new Float64Array(PROP_SLOTS);

  constructor(data: FluidFile) {
    this.data = data;
    this.id = data.id;
    this.designation = data.designation;
    this.pseudoPure = data.pseudoPure;
    this.M = data.molarMass;
    this.R = data.gasConstant;
    this.Tc = data.critical.T;
    this.pc = data.critical.p;
    this.rhoc = data.critical.rho;
    this.Tmin = data.validity.Tmin;
    this.Tmax = data.validity.Tmax;
    this.pmax = data.validity.pmax;
    this.model = buildHelmholtz(data);
    const a = data.ancillaries;
    this.pSat = a.pSat && buildAncillary(a.pSat);
    this.pBubble = a.pBubble && buildAncillary(a.pBubble);
    this.pDew = a.pDew && buildAncillary(a.pDew);
    this.rhoLiquid = buildAncillary(a.rhoLiquid);
    this.rhoVapour = buildAncillary(a.rhoVapour);
    const crit = this.pseudoPure ? { T: this.Tc, rho: this.rhoc } : equationCriticalPoint(this);
    this.TcEquation = crit.T;
    this.rhocEquation = crit.rho;
    this.satTmax = this.pseudoPure ? this.Tc : Math.min(this.Tc, this.TcEquation) - 0.001;
  }
}
