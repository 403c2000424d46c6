// Numbered state points of a cycle: the state, what the point is in the plant (its roles, in the
// trade's words), and the mass flow through it per unit mass flow through the evaporator.
import type { State } from "../eos/index.js";

export type Role =
  | "evaporator-inlet" | "evaporator-outlet"
  | "compressor-suction" | "compressor-discharge"
  | "low-stage-suction" | "low-stage-discharge" | "high-stage-suction" | "high-stage-discharge"
  | "condenser-inlet" | "condenser-outlet" | "gas-cooler-inlet" | "gas-cooler-outlet"
  | "ihx-vapour-outlet" | "ihx-liquid-outlet"
  | "flash-tank-inlet" | "flash-tank-liquid" | "flash-tank-vapour"
  | "economiser-liquid-outlet" | "economiser-injection-inlet" | "economiser-injection-outlet"
  | "isentropic-discharge" | "isentropic-low-stage-discharge" | "isentropic-high-stage-discharge";

/** The words printed for each role. */
export const ROLE_TEXT: Record<Role, string> = {
  "evaporator-inlet": "evaporator inlet",
  "evaporator-outlet": "evaporator outlet",
  "compressor-suction": "compressor suction",
  "compressor-discharge": "compressor discharge",
  "low-stage-suction": "low-stage suction",
  "low-stage-discharge": "low-stage discharge",
  "high-stage-suction": "high-stage suction",
  "high-stage-discharge": "high-stage discharge",
  "condenser-inlet": "condenser inlet",
  "condenser-outlet": "condenser outlet",
  "gas-cooler-inlet": "gas-cooler inlet",
  "gas-cooler-outlet": "gas-cooler outlet",
  "ihx-vapour-outlet": "IHX suction-gas outlet",
  "ihx-liquid-outlet": "IHX liquid outlet",
  "flash-tank-inlet": "flash-tank inlet",
  "flash-tank-liquid": "flash-tank liquid outlet",
  "flash-tank-vapour": "flash-tank vapour outlet",
  "economiser-liquid-outlet": "economiser liquid outlet",
  "economiser-injection-inlet": "economiser injection inlet",
  "economiser-injection-outlet": "economiser injection outlet (to the high stage)",
  "isentropic-discharge": "isentropic discharge (reference for the efficiency)",
  "isentropic-low-stage-discharge": "isentropic low-stage discharge",
  "isentropic-high-stage-discharge": "isentropic high-stage discharge",
};

export interface CyclePoint {
  /** Point number in flow order ("1", "2", …), or for an isentropic end its real point's number with "s" ("2s"). */
  label: string;
  roles: Role[];
  state: State;
  /** Mass flow through the point per unit mass flow through the evaporator. */
  flow: number;
  /** Superheat over the dew point and subcooling below the bubble point at the point's pressure [K], where they apply. */
  superheat?: number;
  subcooling?: number;
}

export function describeRoles(roles: readonly Role[]): string {
  return roles.map((r) => ROLE_TEXT[r]).join(" = ");
}

/** The point carrying a role, if the cycle has one. */
export function findPoint(points: readonly CyclePoint[], role: Role): CyclePoint | undefined {
  return points.find((q) => q.roles.includes(role));
}
