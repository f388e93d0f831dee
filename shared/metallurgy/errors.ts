/**
 * Typed errors of the science core. Every public function rejects bad input with
 * an InputError that names the parameter, the value it got and the range it allows,
 * so the UI and the API can show one clear message instead of a NaN.
 */
export class InputError extends Error {
  readonly parameter: string;
  readonly value: unknown;
  readonly allowed: string;

  constructor(parameter: string, value: unknown, allowed: string) {
    super(`${parameter} = ${formatValue(value)} is outside the allowed range: ${allowed}`);
    this.name = "InputError";
    this.parameter = parameter;
    this.value = value;
    this.allowed = allowed;
  }
}

/** A requested phase balance cannot be met (e.g. a carbide needs more Cr than the alloy holds). */
export class InfeasibleError extends Error {
  readonly reason: string;
  constructor(reason: string, message: string) {
    super(message);
    this.name = "InfeasibleError";
    this.reason = reason;
  }
}

/** Thrown when an explicit time step would make an explicit solver unstable. */
export class StabilityError extends Error {
  readonly dtS: number;
  readonly maxDtS: number;
  constructor(dtS: number, maxDtS: number) {
    super(`time step ${dtS} s exceeds the stability limit ${maxDtS.toPrecision(4)} s`);
    this.name = "StabilityError";
    this.dtS = dtS;
    this.maxDtS = maxDtS;
  }
}

function formatValue(value: unknown): string {
  if (typeof value === "number") return Number.isFinite(value) ? String(value) : String(value);
  try {
    return JSON.stringify(value);
  } catch {
    return String(value);
  }
}
