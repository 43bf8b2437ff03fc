import { describe, expect, it } from 'vitest';
import { ChemError } from '../errors/chem-error';
import type { Peak } from '../types';
import { fragmentNotes } from './fragment-notes';

// Losses and ions: Lange's Handbook of Chemistry, 15th ed., §7.8 (SCIENCE.md §6). Spectra invented.
describe('fragmentNotes', () => {
  it('when a ketone-like spectrum has M−15 and m/z 43, notes the loss of CH3 and the acetyl ion', () => {
    const notes = fragmentNotes([[43, 100], [58, 30], [15, 10]], { formula: 'C3H6O' });
    // C3H6O has too few H for C3H7, so only the acetyl explanations remain; m/z 15 is M−43.
    expect(notes.map((n) => n.label)).toEqual(['M−15: loss of CH3', 'm/z 43: CH3CO+', 'M−43: loss of CH3CO']);
    expect(notes[0]).toMatchObject({ mz: 43, kind: 'loss', lossDa: 15, relIntensity: 100 });
    expect(notes[0]?.source).toContain('Lange');
  });

  it('without a formula, keeps every explanation of a mass difference', () => {
    const notes = fragmentNotes([[100, 40], [72, 100]], { molecularIonMz: 100 });
    expect(notes.map((n) => n.label)).toEqual(['M−28: loss of CO or C2H4']);
  });

  it('when the formula has no chlorine, never notes a loss of Cl or HCl', () => {
    const peaks: Peak[] = [[120, 50], [85, 100], [84, 30]];
    expect(fragmentNotes(peaks, { molecularIonMz: 120 }).map((n) => n.lossDa)).toEqual([35, 36]);
    expect(fragmentNotes(peaks, { formula: 'C9H12' })).toEqual([]);
  });

  it('when a bromide loses Br, notes both isotopic losses (79 and 81)', () => {
    const notes = fragmentNotes([[136, 95], [138, 92], [57, 100]], { formula: 'C4H9Br' });
    expect(notes.map((n) => n.label)).toEqual(['M−79: loss of Br (79Br)', 'm/z 57: C4H9+']);
    // M is 136 (79Br), so M−81 = 55 is absent here: only 57 (from 138 − 81) exists, and it is the butyl ion.
  });

  it('when peaks are below the intensity floor, gives no note for them', () => {
    expect(fragmentNotes([[91, 0.5], [92, 100]], { molecularIonMz: 92 })).toEqual([]);
    expect(fragmentNotes([[91, 0.5], [92, 100]], { molecularIonMz: 92, minRelIntensity: 0.1 })).toHaveLength(1);
  });

  it('when a low-mass ion is not below M, does not note it', () => {
    expect(fragmentNotes([[77, 100]], { molecularIonMz: 77 })).toEqual([]);
  });

  it('does not mutate its input', () => {
    const peaks: Peak[] = [[58, 30], [43, 100]];
    const copy = peaks.map((peak) => [...peak]);
    fragmentNotes(peaks, { molecularIonMz: 58 });
    expect(peaks).toEqual(copy);
  });

  it('when input is bad, throws a documented error', () => {
    expect(() => fragmentNotes([], {})).toThrow(ChemError);
    expect(() => fragmentNotes([[43, 100]], { molecularIonMz: 43.5 })).toThrow(RangeError);
    expect(() => fragmentNotes([[43, 100]], { formula: 'C3Xx' })).toThrow(ChemError);
    expect(() => fragmentNotes([[43, 100]], { minRelIntensity: -1 })).toThrow(RangeError);
  });
});
