/**
 * Numbers the distinct tuples of six integers (each exactly representable in a
 * double) in the order first seen: an open-addressing hash table on typed
 * arrays, used to recognise segment pairs with the same geometry without
 * building a string key for every pair.
 */
export class TupleIndex {
  private keys: Float64Array;
  private ids: Int32Array;
  private mask: number;
  size = 0;

  constructor(expected: number) {
    let capacity = 16;
    while (capacity < 2 * expected) capacity *= 2;
    this.keys = new Float64Array(6 * capacity);
    this.ids = new Int32Array(capacity).fill(-1);
    this.mask = capacity - 1;
  }

  /** The tuple's number, adding it when new. */
  idOf(a: number, b: number, c: number, d: number, e: number, f: number): number {
    if (2 * (this.size + 1) > this.ids.length) this.grow();
    let slot = hash(a, b, c, d, e, f) & this.mask;
    for (;;) {
      const id = this.ids[slot];
      if (id < 0) {
        this.store(slot, this.size, a, b, c, d, e, f);
        return this.size++;
      }
      const k = 6 * slot;
      const keys = this.keys;
      if (keys[k] === a && keys[k + 1] === b && keys[k + 2] === c && keys[k + 3] === d && keys[k + 4] === e && keys[k + 5] === f) return id;
      slot = (slot + 1) & this.mask;
    }
  }

  private store(slot: number, id: number, a: number, b: number, c: number, d: number, e: number, f: number): void {
    const k = 6 * slot;
    this.keys[k] = a;
    this.keys[k + 1] = b;
    this.keys[k + 2] = c;
    this.keys[k + 3] = d;
    this.keys[k + 4] = e;
    this.keys[k + 5] = f;
    this.ids[slot] = id;
  }

  private grow(): void {
    const { keys, ids } = this;
    this.keys = new Float64Array(2 * keys.length);
    this.ids = new Int32Array(2 * ids.length).fill(-1);
    this.mask = this.ids.length - 1;
    for (let old = 0; old < ids.length; old++) {
      if (ids[old] < 0) continue;
      const k = 6 * old;
      let slot = hash(keys[k], keys[k + 1], keys[k + 2], keys[k + 3], keys[k + 4], keys[k + 5]) & this.mask;
      while (this.ids[slot] >= 0) slot = (slot + 1) & this.mask;
      this.store(slot, ids[old], keys[k], keys[k + 1], keys[k + 2], keys[k + 3], keys[k + 4], keys[k + 5]);
    }
  }
}

function mix(h: number, v: number): number {
  const low = v | 0;
  const high = Math.floor(v / 4294967296) | 0;
  h = Math.imul(h ^ low, 0x9e3779b1);
  h = Math.imul(h ^ high, 0x85ebca6b);
  return (h << 13) | (h >>> 19);
}

function hash(a: number, b: number, c: number, d: number, e: number, f: number): number {
  let h = 0x2545f491;
  h = mix(h, a);
  h = mix(h, b);
  h = mix(h, c);
  h = mix(h, d);
  h = mix(h, e);
  h = mix(h, f);
  return h ^ (h >>> 16);
}
