/** The typed-array kinds the search index stores. */
export type PackedArray = Uint8Array | Uint16Array | Uint32Array | Float32Array | Float64Array;

/**
 * Returns `array` if it holds at least `minLength` elements, else a copy twice as large (at least
 * `minLength`) with the old contents; new elements are 0, or `fill` when given.
 * @example
 * const ids = growTypedArray(new Uint32Array(4), 9); // length 9, first 4 kept
 */
export function growTypedArray<T extends PackedArray>(array: T, minLength: number, fill?: number): T {
  if (array.length >= minLength) return array;
  const length = Math.max(minLength, array.length * 2, 16);
  const grown = new (array.constructor as new (length: number) => T)(length);
  grown.set(array as never);
  if (fill !== undefined) grown.fill(fill, array.length);
  return grown;
}

