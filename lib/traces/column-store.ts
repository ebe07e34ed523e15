/** A column of numbers that grows by doubling, so a million rows cost ~20 copies, not a million. */
export class ColumnStore {
  values: Float64Array;
  min = Infinity;
  max = -Infinity;
  numeric = 0;
  nonNumeric = 0;

  constructor(initialCapacity = 1 << 14) {
    this.values = new Float64Array(initialCapacity);
  }

  ensure(capacity: number): void {
    if (capacity <= this.values.length) return;
    let size = this.values.length * 2;
    while (size < capacity) size *= 2;
    const grown = new Float64Array(size);
    grown.set(this.values);
    this.values = grown;
  }

  /** The first `length` values, without a copy. */
  view(length: number): Float64Array {
    return this.values.subarray(0, length);
  }
}
