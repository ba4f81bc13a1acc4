// Typed-array work space for the hot paths. A typed array of more than 64 bytes is allocated
// outside V8's heap (about a microsecond or more each, and its memory counts towards full
// collections), so the engine takes views of shared buffers or a kept array instead of many small
// ones per solve.

/**
 * Zeroed views of shared buffers, allocated when first needed, `chunk` numbers each: a small typed
 * array of its own costs an allocation outside the heap (microseconds each, hundreds per solve),
 * a view of a shared one not.
 */
export function viewsOf(chunk: number): (length: number) => Float64Array {
  let buffer = new Float64Array(0);
  let used = 0;
  return (length) => {
    if (used + length > buffer.length) {
      buffer = new Float64Array(Math.max(chunk, length));
      used = 0;
    }
    const view = buffer.subarray(used, used + length);
    used += length;
    return view;
  };
}

/**
 * A work array of at least `size` numbers (contents undefined). Up to 1 M numbers (8 MB) it is kept
 * and handed out again on the next call: a large typed array per call was slow to allocate, and the
 * memory it counted outside the heap brought on full garbage collections. Larger ones are not
 * kept, so a long-lived solver thread does not hold on to one huge model's memory. Callers must
 * not keep it past their return, nor ask again with the same `kept` while using it.
 */
export function workArray(size: number, kept: { array: Float64Array<ArrayBuffer> }): Float64Array<ArrayBuffer> {
  if (kept.array.length >= size) return kept.array;
  const array = new Float64Array(size);
  if (size <= 1 << 20) kept.array = array;
  return array;
}
