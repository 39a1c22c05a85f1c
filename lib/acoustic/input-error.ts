// Typed construction of the engine's input errors: a RangeError naming the field by its path.

/** Builds the RangeError the engine throws for bad input, e.g. `segments[2].lengthM must be > 0`. */
export function inputError(fieldPath: string, requirement: string): RangeError {
  return new RangeError(`${fieldPath} ${requirement}`);
}

/** Throws unless value is a finite number. */
export function requireFinite(value: unknown, fieldPath: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw inputError(fieldPath, 'must be a finite number');
  }
  return value;
}

/** Throws unless value is a finite number strictly above the bound. */
export function requireAbove(value: unknown, bound: number, fieldPath: string): number {
  const checked = requireFinite(value, fieldPath);
  if (!(checked > bound)) throw inputError(fieldPath, `must be > ${bound}`);
  return checked;
}

/** Throws unless value is a finite number at or above the bound. */
export function requireAtLeast(value: unknown, bound: number, fieldPath: string): number {
  const checked = requireFinite(value, fieldPath);
  if (!(checked >= bound)) throw inputError(fieldPath, `must be >= ${bound}`);
  return checked;
}

/** Throws unless value is a finite number at or below the bound. */
export function requireAtMost(value: unknown, bound: number, fieldPath: string): number {
  const checked = requireFinite(value, fieldPath);
  if (!(checked <= bound)) throw inputError(fieldPath, `must be <= ${bound}`);
  return checked;
}

/** Throws unless value is a finite number in (low, high]. */
export function requireAboveAtMost(value: unknown, low: number, high: number, fieldPath: string): number {
  return requireAtMost(requireAbove(value, low, fieldPath), high, fieldPath);
}

/** Throws unless value is a finite number in [low, high]. */
export function requireBetween(value: unknown, low: number, high: number, fieldPath: string): number {
  const checked = requireFinite(value, fieldPath);
  if (!(checked >= low && checked <= high)) throw inputError(fieldPath, `must be between ${low} and ${high}`);
  return checked;
}

/** The path of a field inside parentPath: `elements[2]` + `lengthM` -> `elements[2].lengthM`; a top-level field keeps its own name. */
export function fieldPath(parentPath: string, name: string): string {
  return parentPath ? `${parentPath}.${name}` : name;
}
