/**
 * Bad input to a wood-science function. The functions throw rather than return a number
 * they cannot stand behind; `field` names the offending parameter so an API can answer 400
 * with the field and a form can show the message beside it.
 */
export class DomainError extends Error {
  readonly field: string;

  constructor(field: string, message: string) {
    super(message);
    // Keeps `instanceof` working where a bundler compiles classes down to functions.
    Object.setPrototypeOf(this, new.target.prototype);
    this.name = 'DomainError';
    this.field = field;
  }
}

/** 'relativeHumidityPercent' → 'Relative humidity percent', for messages people read. */
export function fieldWords(field: string): string {
  const last = field.split('.').pop() ?? field;
  const words = last.replace(/([a-z0-9])([A-Z])/g, '$1 $2').toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** A finite number, or a DomainError naming the field. */
export function requireFinite(field: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new DomainError(field, `${fieldWords(field)} must be a number.`);
  }
  return value;
}

export function requireNonNegative(field: string, value: number): number {
  requireFinite(field, value);
  if (value < 0) throw new DomainError(field, `${fieldWords(field)} must not be negative.`);
  return value;
}

export function requirePositive(field: string, value: number): number {
  requireFinite(field, value);
  if (value <= 0) throw new DomainError(field, `${fieldWords(field)} must be greater than zero.`);
  return value;
}

export function requireInRange(field: string, value: number, min: number, max: number): number {
  requireFinite(field, value);
  if (value < min || value > max) {
    throw new DomainError(field, `${fieldWords(field)} must be between ${min} and ${max}.`);
  }
  return value;
}
