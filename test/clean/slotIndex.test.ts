import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { NumberSlotIndex, StringSlotIndex } from '../../src/clean/slotIndex.js';

// Reference: the language's own Map (ECMAScript §24.1) fed the same operations.
describe('slot indexes behave as a Map from key to first slot', () => {
  it('numbers (property-based, with repeats and keys past 2^32)', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.nat(50), fc.nat(), fc.integer({ min: 2 ** 32, max: 2 ** 40 })), { maxLength: 3000 }), (keys) => {
        const idx = new NumberSlotIndex();
        const ref = new Map<number, number>();
        for (let k = 0; k < keys.length; k++) {
          const want = ref.get(keys[k]) ?? -1;
          if (want < 0) ref.set(keys[k], k);
          if (idx.lookupOrInsert(keys[k], k) !== want) return false;
        }
        return idx.size === ref.size && [...ref].every(([key, slot]) => idx.get(key) === slot) && idx.get(-5) === -1;
      }),
    );
  });

  it('strings (property-based, with repeats)', () => {
    fc.assert(
      fc.property(fc.array(fc.oneof(fc.constantFrom('2031 AB7', 'C/2031 A1', ''), fc.string()), { maxLength: 3000 }), (keys) => {
        const idx = new StringSlotIndex();
        const ref = new Map<string, number>();
        for (let k = 0; k < keys.length; k++) {
          const want = ref.get(keys[k]) ?? -1;
          if (want < 0) ref.set(keys[k], k);
          if (idx.lookupOrInsert(keys[k], k) !== want) return false;
        }
        return idx.size === ref.size && [...ref].every(([key, slot]) => idx.get(key) === slot);
      }),
    );
  });

  it('holds a million keys through many rehashes', () => {
    const idx = new NumberSlotIndex();
    for (let k = 0; k < 1_000_000; k++) idx.lookupOrInsert(9_000_001 + 3 * k, k);
    expect(idx.size).toBe(1_000_000);
    expect(idx.get(9_000_001 + 3 * 777_777)).toBe(777_777);
    expect(idx.get(9_000_002)).toBe(-1);
  });
});
