/**
 * Returns `value` when it is a finite number above `above` and at most `atMost`; otherwise
 * throws a RangeError that names the field, the limits and what was given.
 */
export function checkNumber(
  field: string,
  value: unknown,
  limits: { above: number; atMost: number; unit: string },
): number {
  const { above, atMost, unit } = limits;
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${field} must be a number of ${unit} (got ${String(value)})`);
  }
  if (value <= above || value > atMost) {
    throw new RangeError(`${field} must be more than ${above} and at most ${atMost} ${unit} (got ${value})`);
  }
  return value;
}
