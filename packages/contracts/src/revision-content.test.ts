import { describe, expect, it } from 'vitest';
import { casCheckDigitOk, RevisionContentSchema } from './revision-content';

const base = { name: 'Test', formula: 'C3H6O', peaks: [[43, 100], [58, 25]] };

describe('casCheckDigitOk', () => {
  // CAS RN check-digit rule (common practice); the numbers below are from memory: water 7732-18-5,
  // ethanol 64-17-5, acetone 67-64-1. The rule's arithmetic is what is tested, not the registry.
  it.each(['7732-18-5', '64-17-5', '67-64-1'])('accepts %s', (cas) => {
    expect(casCheckDigitOk(cas)).toBe(true);
  });
  it.each(['7732-18-4', '64-17-6', '67-64-2'])('rejects %s with a wrong check digit', (cas) => {
    expect(casCheckDigitOk(cas)).toBe(false);
  });
});

describe('RevisionContentSchema', () => {
  it('fills defaults for a minimal revision', () => {
    const r = RevisionContentSchema.parse(base);
    expect(r.conditions.ionizationEnergyEv).toBe(70);
    expect(r.synonyms).toEqual([]);
    expect(r.retentionIndex).toBeNull();
  });

  it('when the formula has an unknown element, reports it on the formula field', () => {
    const r = RevisionContentSchema.safeParse({ ...base, formula: 'C3Xx' });
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.path.join('.'))).toEqual(['formula']);
  });

  it('when a peak has a negative m/z or NaN intensity, names the peak and the position in it', () => {
    const r = RevisionContentSchema.safeParse({ ...base, peaks: [[43, 100], [-1, 5], [50, Number.NaN]] });
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.path.join('.'))).toEqual(['peaks.1.0', 'peaks.2.1']);
  });

  it('refuses a structure without its format, and unknown fields', () => {
    expect(RevisionContentSchema.safeParse({ ...base, structure: 'CC(C)=O' }).success).toBe(false);
    expect(RevisionContentSchema.safeParse({ ...base, colour: 'red' }).success).toBe(false);
  });

  it('refuses a scan range that runs backwards', () => {
    const r = RevisionContentSchema.safeParse({ ...base, conditions: { scanRange: { fromMz: 500, toMz: 40 } } });
    expect(r.error?.issues[0]?.path.join('.')).toBe('conditions.scanRange.toMz');
  });
});
