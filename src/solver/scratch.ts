/** Work arrays kept from one solve to the next of the same grid size, handed out zeroed. */

/** The typed-array kinds the solver keeps. */
type Kept = Float64Array | Float32Array | Int32Array | Uint8Array;

/** Grid sizes each slot keeps: the app alternates a coarse drag grid and the full grid. */
const SIZES_PER_SLOT = 2;

/**
 * Named work arrays reused between solves. A fresh large typed array costs a page fault on its first write to
 * every 4 KiB (measured on the benchmark machine: 21 ms to allocate and fill 8 MB, 0.25 ms to fill it again), and
 * its later collection; a solve at 1M cells makes about 45 MB of arrays that do not outlive it.
 * Every array is zeroed when handed out, so a solve never sees a previous solve's numbers. An array taken from a
 * slot is valid until the same slot is taken again: results handed to callers must never come from here.
 */
export class ScratchArrays {
  private readonly slots = new Map<string, Kept[]>();

  float64(slot: string, length: number): Float64Array {
    return this.take(slot, length, (n) => new Float64Array(n));
  }

  float32(slot: string, length: number): Float32Array {
    return this.take(slot, length, (n) => new Float32Array(n));
  }

  int32(slot: string, length: number): Int32Array {
    return this.take(slot, length, (n) => new Int32Array(n));
  }

  uint8(slot: string, length: number): Uint8Array {
    return this.take(slot, length, (n) => new Uint8Array(n));
  }

  private take<T extends Kept>(slot: string, length: number, make: (length: number) => T): T {
    const kept = this.slots.get(slot) ?? [];
    const at = kept.findIndex((a) => a.length === length);
    const array = at >= 0 ? (kept.splice(at, 1)[0] as T) : make(length);
    if (at >= 0) array.fill(0);
    kept.unshift(array);
    if (kept.length > SIZES_PER_SLOT) kept.pop();
    this.slots.set(slot, kept);
    return array;
  }
}

/** Zeroed arrays from `scratch` when given, else fresh ones (callers that keep what they get pass null). */
export function float64Of(scratch: ScratchArrays | null, slot: string, length: number): Float64Array {
  return scratch ? scratch.float64(slot, length) : new Float64Array(length);
}

export function uint8Of(scratch: ScratchArrays | null, slot: string, length: number): Uint8Array {
  return scratch ? scratch.uint8(slot, length) : new Uint8Array(length);
}

export function float32Of(scratch: ScratchArrays | null, slot: string, length: number): Float32Array {
  return scratch ? scratch.float32(slot, length) : new Float32Array(length);
}

export function int32Of(scratch: ScratchArrays | null, slot: string, length: number): Int32Array {
  return scratch ? scratch.int32(slot, length) : new Int32Array(length);
}
