import { describe, expect, it } from 'vitest';
import { diffPeaks, diffRevisions } from './diff-revisions';

// An invented (simulated) revision pair; the values only need to differ where the test says so.
const published = {
  name: 'Methyl 4-chlorobenzoate',
  synonyms: [],
  formula: 'C8H7ClO2',
  structure: 'COC(=O)c1ccc(Cl)cc1',
  structureFormat: 'smiles' as const,
  casRn: null,
  conditions: { ionizationEnergyEv: 70, inlet: 'GC' },
  retentionIndex: { value: 1290, column: 'non-polar' },
  sampleNotes: 'Lot QX-17, 99.2 % by GC-FID',
  peaks: [
    [111, 38],
    [139, 100],
    [170, 31],
    [172, 10],
  ] as Array<[number, number]>,
};

describe('diffRevisions', () => {
  it('when the formula changes, marks only the formula row as changed and keeps both values', () => {
    const diff = diffRevisions({ ...published, formula: 'C8H7BrO2' }, published);
    const changed = diff.fields.filter((field) => field.changed);
    expect(changed.map((field) => field.field)).toEqual(['formula']);
    expect(changed[0]).toMatchObject({ before: 'C8H7ClO2', after: 'C8H7BrO2' });
  });

  it('when conditions and retention index change, shows them as text with units', () => {
    const diff = diffRevisions(
      { ...published, conditions: { ionizationEnergyEv: 70, inlet: 'GC', sourceTemperatureC: 230 }, retentionIndex: { value: 1295, column: 'non-polar' } },
      published,
    );
    const byField = Object.fromEntries(diff.fields.map((field) => [field.field, field]));
    expect(byField.sourceTemperatureC).toMatchObject({ before: null, after: '230 °C', changed: true });
    expect(byField.retentionIndex).toMatchObject({ before: '1290 (non-polar)', after: '1295 (non-polar)', changed: true });
    expect(byField.ionizationEnergyEv).toMatchObject({ after: '70 eV', changed: false });
  });

  it('when there is no published revision, every filled field counts as new and all peaks as added', () => {
    const diff = diffRevisions(published, null);
    expect(diff.fields.find((field) => field.field === 'name')).toMatchObject({ before: null, changed: true });
    expect(diff.fields.find((field) => field.field === 'casRn')).toMatchObject({ after: null, changed: false });
    expect(diff.peaks.added).toHaveLength(4);
  });
});

describe('diffPeaks', () => {
  it('when peaks are added, removed and rescaled, lists each by m/z in m/z order', () => {
    const diff = diffPeaks(
      [
        [75, 12],
        [111, 38],
        [139, 100],
        [170, 33],
      ],
      published.peaks,
    );
    expect(diff.added).toEqual([[75, 12]]);
    expect(diff.removed).toEqual([[172, 10]]);
    expect(diff.changed).toEqual([{ mz: 170, beforeRelIntensity: 31, afterRelIntensity: 33 }]);
  });

  it('when intensities differ below the shown precision (0.1 of 100), they are not a change', () => {
    expect(diffPeaks([[139, 100.02]], [[139, 100]]).changed).toEqual([]);
  });
});
