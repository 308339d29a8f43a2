/**
 * Calculators refuse bad input loudly instead of returning NaN or Infinity:
 * a silent NaN would flow into a homeowner's plan as "Water NaN minutes".
 * `field` names the argument so callers can point at the form field.
 */
export class CalculatorInputError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = "CalculatorInputError";
    this.field = field;
  }
}

export function requireFinite(field: string, value: number): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new CalculatorInputError(field, "must be a finite number");
  }
  return value;
}

export function requireNonNegative(field: string, value: number): number {
  requireFinite(field, value);
  if (value < 0) throw new CalculatorInputError(field, "must not be negative");
  return value;
}

export function requirePositive(field: string, value: number): number {
  requireFinite(field, value);
  if (value <= 0) throw new CalculatorInputError(field, "must be greater than zero");
  return value;
}

/** A percentage on a seed tag or fertiliser bag: 0–100 inclusive. */
export function requirePercent(field: string, value: number): number {
  requireNonNegative(field, value);
  if (value > 100) throw new CalculatorInputError(field, "must be 100 % or less");
  return value;
}
