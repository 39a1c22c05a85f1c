// Short random ids for plan items. Commands take an IdGenerator so tests can be deterministic.

export type IdGenerator = () => string;

/** An 8-character random id. */
export function randomId(): string {
  return crypto.randomUUID().slice(0, 8);
}

/** Deterministic ids `prefix1`, `prefix2`, … (for tests and fixtures). */
export function sequentialIds(prefix = 'id'): IdGenerator {
  let count = 0;
  return () => {
    count += 1;
    return `${prefix}${count}`;
  };
}
