import { describe, expect, it } from 'vitest';
import { ChemError } from '../errors/chem-error';
import type { ElementCounts } from '../elements/elements';
import { toElementCounts } from './to-element-counts';

describe('toElementCounts', () => {
  it('returns a new frozen object without zero counts and leaves its input unchanged', () => {
    const input = { C: 6, H: 6, N: 0 };
    const out = toElementCounts(input);
    expect(out).toEqual({ C: 6, H: 6 });
    expect(out).not.toBe(input);
    expect(input).toEqual({ C: 6, H: 6, N: 0 });
    expect(Object.isFrozen(out)).toBe(true);
  });

  it('when a count is negative, fractional or NaN, throws INVALID_ARGUMENT naming the field', () => {
    for (const bad of [-1, 1.5, NaN, Infinity]) {
      try {
        toElementCounts({ C: 2, H: bad });
        expect.unreachable();
      } catch (e) {
        expect(e).toBeInstanceOf(ChemError);
        expect((e as ChemError).code).toBe('INVALID_ARGUMENT');
        expect((e as ChemError).field).toBe('formula.H');
      }
    }
  });

  it('when a key is not a supported element, throws UNKNOWN_ELEMENT naming the field', () => {
    expect(() => toElementCounts({ Xx: 1 } as unknown as ElementCounts, 'counts')).toThrow(
      expect.objectContaining({ code: 'UNKNOWN_ELEMENT', field: 'counts.Xx' }),
    );
  });

  it('when given neither text nor an object, throws TypeError', () => {
    expect(() => toElementCounts(null as unknown as string)).toThrow(TypeError);
    expect(() => toElementCounts([] as unknown as string)).toThrow(TypeError);
  });
});
