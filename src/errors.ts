// Errors as values: every failure carries a code, the input it concerns, the value and what is allowed.
// The CLI maps codes to exit codes; nothing in domeprint throws a bare string.

export type ErrorCode =
  | "E_INPUT" // missing, NaN, infinite, negative or malformed input
  | "E_RANGE" // outside the equation's range of validity
  | "E_BELOW_TRIPLE" // below the triple point (solid region)
  | "E_CONVERGENCE" // an iteration did not converge within its cap
  | "E_UNKNOWN_FLUID"
  | "E_UNKNOWN_QUANTITY"
  | "E_UNIT"
  | "E_UNSUPPORTED" // a valid request the engine does not provide (e.g. an input pair)
  | "E_REFERENCE" // a reference state that cannot be defined for this fluid
  | "E_FLUID_FILE"; // a fluid data file that fails its schema

export interface ErrorDetails {
  /** The name of the input or key the error concerns (e.g. "T", "fluid", "sheets[2].paper"). */
  input?: string;
  /** The offending value, as given. */
  value?: unknown;
  /** What is allowed, in words (a range, a list). */
  allowed?: string;
  /** Near matches for an unknown name. */
  suggestions?: string[];
}

export class DomeprintError extends Error {
  readonly code: ErrorCode;
  readonly details: ErrorDetails;

  constructor(code: ErrorCode, message: string, details: ErrorDetails = {}) {
    super(message);
    this.name = "DomeprintError";
    this.code = code;
    this.details = details;
  }

  toJSON(): Record<string, unknown> {
    return { code: this.code, message: this.message, ...this.details };
  }
}

/** Formats a value for an error message without drowning it in digits. */
export function show(value: unknown): string {
  if (typeof value === "number") return Number.isFinite(value) ? String(+value.toPrecision(10)) : String(value);
  if (typeof value === "string") return JSON.stringify(value);
  return String(value);
}

export function inputError(input: string, value: unknown, problem: string, allowed: string): DomeprintError {
  return new DomeprintError("E_INPUT", `${input} = ${show(value)}: ${problem}; allowed: ${allowed}`, { input, value, allowed });
}

export function rangeError(input: string, value: unknown, allowed: string, code: ErrorCode = "E_RANGE"): DomeprintError {
  const problem = code === "E_BELOW_TRIPLE" ? "below the triple point (solid region)" : "outside the equation's range of validity";
  return new DomeprintError(code, `${input} = ${show(value)}: ${problem}; allowed: ${allowed}`, { input, value, allowed });
}

export function convergenceError(what: string, inputs: string): DomeprintError {
  return new DomeprintError("E_CONVERGENCE", `${what} did not converge for ${inputs}`, { input: what, value: inputs, allowed: "a state inside the equation's range" });
}

/** Checks that a number is present and finite (and, unless allowNegative, not negative). */
export function requireNumber(input: string, value: unknown, opts: { positive?: boolean; allowNegative?: boolean } = {}): number {
  if (value === undefined || value === null || value === "") throw inputError(input, value, "missing", "a finite number");
  if (typeof value !== "number") throw inputError(input, value, "not a number", "a finite number");
  if (Number.isNaN(value)) throw inputError(input, value, "not a number (NaN)", "a finite number");
  if (!Number.isFinite(value)) throw inputError(input, value, "not finite", "a finite number");
  if (opts.positive && value <= 0) throw inputError(input, value, "must be positive", "a number > 0");
  if (!opts.allowNegative && !opts.positive && value < 0) throw inputError(input, value, "must not be negative", "a number ≥ 0");
  return value;
}

/** Runs fn; a typed DomeprintError becomes undefined (a state the caller may do without), anything else is rethrown. */
export function attempt<T>(fn: () => T): T | undefined {
  try {
    return fn();
  } catch (e) {
    if (e instanceof DomeprintError) return undefined;
    throw e;
  }
}
