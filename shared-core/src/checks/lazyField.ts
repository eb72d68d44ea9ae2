/**
 * A field of a result record computed when first read (issue 7: per-check cost). The Haigh
 * diagram's curves are some 200 points per check that only a diagram or a report reads; the
 * record keeps a getter that computes them once and then holds them as a plain field. JSON,
 * structured clone, spread and deep equality all read the field as if it were a plain one.
 */
export function lazyField<T extends object, K extends keyof T>(
  record: Omit<T, K>,
  key: K,
  compute: () => T[K],
): T {
  const settle = (target: object, value: T[K]): void => {
    Object.defineProperty(target, key, { value, enumerable: true, writable: true, configurable: true });
  };
  Object.defineProperty(record, key, {
    enumerable: true,
    configurable: true,
    get(this: object) {
      const value = compute();
      settle(this, value);
      return value;
    },
    set(this: object, value: T[K]) {
      settle(this, value);
    },
  });
  return record as T;
}
