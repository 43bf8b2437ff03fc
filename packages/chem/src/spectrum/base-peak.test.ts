import { describe, expect, it } from 'vitest';
import { basePeak } from './base-peak';

describe('basePeak', () => {
  it('returns the most intense peak (the base peak, common practice)', () => {
    expect(basePeak([[15, 10], [43, 100], [58, 25]])).toEqual([43, 100]);
  });
  it('when two peaks share the top intensity, returns the one of lower m/z', () => {
    expect(basePeak([[91, 50], [65, 50], [39, 20]])).toEqual([65, 50]);
  });
  it('when the list is empty, throws EMPTY_SPECTRUM', () => {
    expect(() => basePeak([])).toThrow(expect.objectContaining({ code: 'EMPTY_SPECTRUM' }));
  });
});
