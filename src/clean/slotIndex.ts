/**
 * Open-addressing hash tables from a body's key (its number, or its designation) to its
 * catalogue slot. They stand in for Map because a Map insert costs several hundred
 * nanoseconds at a million entries, a third of all ingestion time; these cost tens.
 * Linear probing, load factor ≤ 1/2, doubling (Knuth, TAOCP vol. 3, §6.4, algorithm L).
 * Hashes: Fibonacci multiplicative hashing for integers (Knuth §6.4) and 32-bit FNV-1a
 * for strings (Fowler, Noll & Vo; IETF draft-eastlake-fnv).
 *
 * The two classes repeat one algorithm on purpose: a generic class with the hash passed in
 * and keys in a plain array measured 1.5–2× slower (polymorphic hash call, boxed keys).
 */

const EMPTY = -1;

/** Mixes a non-negative integer (up to 2^53) to 32 bits. */
function hashInteger(n: number): number {
  const lo = n >>> 0;
  const hi = (n / 4_294_967_296) >>> 0;
  return Math.imul(lo ^ Math.imul(hi, 0x85ebca6b), 0x9e3779b1) >>> 0;
}

/** 32-bit FNV-1a over UTF-16 code units. */
function hashString(s: string): number {
  let h = 0x811c9dc5;
  for (let k = 0; k < s.length; k++) {
    h ^= s.charCodeAt(k);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}

/** Table size for an expected number of keys: a power of two, at least twice as many. */
function tableSize(expectedKeys: number): number {
  let n = 1 << 10;
  while (n < 2 * expectedKeys && n < 1 << 30) n *= 2;
  return n;
}

/** Integer key → slot. */
export class NumberSlotIndex {
  private keys: Float64Array;
  private slots: Int32Array;
  private count = 0;

  constructor(expectedKeys = 0) {
    this.keys = new Float64Array(tableSize(expectedKeys));
    this.slots = new Int32Array(this.keys.length).fill(EMPTY);
  }

  get size(): number {
    return this.count;
  }

  /** Slot stored for `key`, or -1. */
  get(key: number): number {
    const mask = this.slots.length - 1;
    for (let h = hashInteger(key) & mask; ; h = (h + 1) & mask) {
      const s = this.slots[h];
      if (s === EMPTY || this.keys[h] === key) return s;
    }
  }

  /**
   * The slot stored for `key` if there is one; otherwise stores `slot` under it and returns
   * -1. One hash and one probe sequence for the common "new body" case.
   */
  lookupOrInsert(key: number, slot: number): number {
    if (2 * (this.count + 1) > this.slots.length) this.rehash(this.slots.length * 2);
    const mask = this.slots.length - 1;
    let h = hashInteger(key) & mask;
    for (; this.slots[h] !== EMPTY; h = (h + 1) & mask) if (this.keys[h] === key) return this.slots[h];
    this.keys[h] = key;
    this.slots[h] = slot;
    this.count++;
    return EMPTY;
  }

  /** Store `slot` under `key` (the key must not be present yet). */
  set(key: number, slot: number): void {
    if (2 * (this.count + 1) > this.slots.length) this.rehash(this.slots.length * 2);
    const mask = this.slots.length - 1;
    let h = hashInteger(key) & mask;
    while (this.slots[h] !== EMPTY) h = (h + 1) & mask;
    this.keys[h] = key;
    this.slots[h] = slot;
    this.count++;
  }

  private rehash(capacity: number): void {
    const oldKeys = this.keys;
    const oldSlots = this.slots;
    this.keys = new Float64Array(capacity);
    this.slots = new Int32Array(capacity).fill(EMPTY);
    this.count = 0;
    for (let k = 0; k < oldSlots.length; k++) if (oldSlots[k] !== EMPTY) this.set(oldKeys[k], oldSlots[k]);
  }
}

/** String key → slot. */
export class StringSlotIndex {
  private keys: string[];
  private slots: Int32Array;
  private count = 0;

  constructor(expectedKeys = 0) {
    this.slots = new Int32Array(tableSize(expectedKeys)).fill(EMPTY);
    this.keys = new Array<string>(this.slots.length).fill('');
  }

  get size(): number {
    return this.count;
  }

  get(key: string): number {
    const mask = this.slots.length - 1;
    for (let h = hashString(key) & mask; ; h = (h + 1) & mask) {
      const s = this.slots[h];
      if (s === EMPTY || this.keys[h] === key) return s;
    }
  }

  /** As NumberSlotIndex.lookupOrInsert. */
  lookupOrInsert(key: string, slot: number): number {
    if (2 * (this.count + 1) > this.slots.length) this.rehash(this.slots.length * 2);
    const mask = this.slots.length - 1;
    let h = hashString(key) & mask;
    for (; this.slots[h] !== EMPTY; h = (h + 1) & mask) if (this.keys[h] === key) return this.slots[h];
    this.keys[h] = key;
    this.slots[h] = slot;
    this.count++;
    return EMPTY;
  }

  set(key: string, slot: number): void {
    if (2 * (this.count + 1) > this.slots.length) this.rehash(this.slots.length * 2);
    const mask = this.slots.length - 1;
    let h = hashString(key) & mask;
    while (this.slots[h] !== EMPTY) h = (h + 1) & mask;
    this.keys[h] = key;
    this.slots[h] = slot;
    this.count++;
  }

  private rehash(capacity: number): void {
    const oldKeys = this.keys;
    const oldSlots = this.slots;
    this.keys = new Array<string>(capacity).fill('');
    this.slots = new Int32Array(capacity).fill(EMPTY);
    this.count = 0;
    for (let k = 0; k < oldSlots.length; k++) if (oldSlots[k] !== EMPTY) this.set(oldKeys[k], oldSlots[k]);
  }
}
