// jsonSafe copies a calculator's result as JSON would carry it. The reference is the plain
// JSON.stringify / JSON.parse round trip with non-finite numbers written as null.
import fc from 'fast-check';

import { jsonSafe } from '@/lib/calculators/run-calculation';

const roundTrip = (v: unknown) => JSON.parse(JSON.stringify(v, (_k, x: unknown) => (typeof x === 'number' && !Number.isFinite(x) ? null : x)) ?? 'null');

describe('jsonSafe', () => {
  it('equals the JSON round trip on generated values with infinities, NaN, -0, undefined and nesting', () => {
    const leaf = fc.oneof(fc.double(), fc.constantFrom(Infinity, -Infinity, NaN, -0, undefined, null), fc.string(), fc.boolean(), fc.integer());
    const value = fc.letrec((tie) => ({
      node: fc.oneof({ depthSize: 'small' }, leaf, fc.array(tie('node'), { maxLength: 4 }), fc.dictionary(fc.string({ maxLength: 6 }), tie('node'), { maxKeys: 4 })),
    })).node;
    fc.assert(
      fc.property(value, (v) => {
        expect(jsonSafe(v)).toStrictEqual(roundTrip(v));
      }),
      { numRuns: 2000 },
    );
  });

  it('treats dates, maps, typed arrays, functions and toJSON as JSON does', () => {
    const v = {
      when: new Date(Date.UTC(2026, 11, 2)),
      map: new Map([['a', 1]]),
      typed: Float64Array.from([1, Infinity]),
      fn: () => 1,
      custom: { toJSON: () => ({ kept: Infinity }) },
      list: [undefined, () => 1, NaN, -0],
      nested: Object.assign(Object.create(null) as object, { x: -Infinity }),
    };
    expect(jsonSafe(v)).toStrictEqual(roundTrip(v));
    expect(jsonSafe({ when: v.when })).toEqual({ when: '2026-12-02T00:00:00.000Z' });
    expect(Object.is((jsonSafe([-0]) as number[])[0], 0)).toBe(true);
    expect(jsonSafe(undefined)).toBeNull();
  });
});
