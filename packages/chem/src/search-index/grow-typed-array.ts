/** The typed-array kinds the search index stores. */
export type PackedArray = Uint8Array | Uint16Array | Uint32Array | Float32Array | Float64Array;

/**
 * Returns `array` if it holds at least `minLength` elements, else a copy twice as large (at least
 * `minLength`) with the old contents; new elements are 0, or `fill` when given. With `shared`, the copy
 * lives in a SharedArrayBuffer.
 * @example
 * const ids = growTypedArray(new Uint32Array(4), 9); // length 9, first 4 kept
 */
export function growTypedArray<T extends PackedArray>(array: T, minLength: number, fill?: number, shared = false): T {
  if (array.length >= minLength) return array;
  const length = Math.max(minLength, array.length * 2, 16);
  const grown = allocateLike(array, length, shared);
  grown.set(array as never);
  if (fill !== undefined) grown.fill(fill, array.length);
  return grown;
}


/**
 * A zeroed array of the same kind as `like`, in a SharedArrayBuffer when `shared` (so that worker
 * threads can read it without a copy), else in an ordinary one.
 * @example
 * const slots = allocateLike(new Uint32Array(0), 1000, true);
 */
export function allocateLike<T extends PackedArray>(like: T, length: number, shared: boolean): T {
  const Kind = like.constructor as { new (length: number): T; new (buffer: ArrayBufferLike): T; BYTES_PER_ELEMENT: number };
  return shared ? new Kind(new SharedArrayBuffer(length * Kind.BYTES_PER_ELEMENT)) : new Kind(length);
}
