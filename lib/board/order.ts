/**
 * The order of n numbers, exactly, several times faster than Array.prototype.sort with a
 * comparator: each value is packed with its index into one key (the value to 0.1 µm, the index
 * in the low digits), the keys are sorted by the engine's native numeric sort, and one insertion
 * pass puts right the rare neighbours closer together than 0.1 µm. Values so large that the keys
 * would lose digits fall back to a comparator sort.
 */

const QUANTUM = 1e-7;

/** Fills `out[0..n)` with the indices of `values[0..n)` in ascending order of value; `keys` is scratch. */
export function orderByValue(values: Float64Array, n: number, keys: Float64Array, out: Int32Array): void {
  const slots = 2 ** Math.ceil(Math.log2(n + 1));
  let largest = 0;
  for (let i = 0; i < n; i++) largest = Math.max(largest, Math.abs(values[i]));
  if ((largest / QUANTUM + 1) * slots >= Number.MAX_SAFE_INTEGER) {
    const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => values[a] - values[b]);
    for (let i = 0; i < n; i++) out[i] = order[i];
    return;
  }
  for (let i = 0; i < n; i++) keys[i] = Math.floor(values[i] / QUANTUM) * slots + i;
  keys.subarray(0, n).sort();
  for (let k = 0; k < n; k++) out[k] = keys[k] - Math.floor(keys[k] / slots) * slots;
  // Insertion pass: only values within one quantum of each other can be out of order.
  for (let k = 1; k < n; k++) {
    const i = out[k];
    let j = k - 1;
    while (j >= 0 && values[out[j]] > values[i]) {
      out[j + 1] = out[j];
      j--;
    }
    out[j + 1] = i;
  }
}
