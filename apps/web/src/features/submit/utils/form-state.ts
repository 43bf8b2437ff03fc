import type { PeakList } from '@ionfolio/chem';
import type { RevisionDraft } from '../api/revision-draft';

/** The submit form as the person types it: text everywhere, turned into a revision body on save. */
export type SubmitForm = {
  name: string;
  /** One synonym a line. */
  synonyms: string;
  formula: string;
  structureFormat: 'smiles' | 'molfile';
  structure: string;
  casRn: string;
  ionizationEnergyEv: string;
  instrumentType: string;
  inlet: string;
  sourceTemperatureC: string;
  column: string;
  scanFromMz: string;
  scanToMz: string;
  retentionIndex: string;
  retentionIndexColumn: 'non-polar' | 'semi-polar' | 'polar';
  sampleNotes: string;
  changeNote: string;
  peaksText: string;
};

export function emptyForm(): SubmitForm {
  return {
    name: '',
    synonyms: '',
    formula: '',
    structureFormat: 'smiles',
    structure: '',
    casRn: '',
    ionizationEnergyEv: '70',
    instrumentType: '',
    inlet: '',
    sourceTemperatureC: '',
    column: '',
    scanFromMz: '',
    scanToMz: '',
    retentionIndex: '',
    retentionIndexColumn: 'non-polar',
    sampleNotes: '',
    changeNote: '',
    peaksText: '',
  };
}

const numberText = (value: number | undefined | null) => (value === undefined || value === null ? '' : String(value));

/** Peaks as the text area shows them: one `m/z intensity` line each (parsePeakList reads it back). */
export function peaksToText(peaks: PeakList): string {
  return peaks.map(([mz, intensity]) => `${mz} ${Math.round(intensity * 100) / 100}`).join('\n');
}

function columnClass(value: string | undefined): SubmitForm['retentionIndexColumn'] {
  return value === 'semi-polar' || value === 'polar' ? value : 'non-polar';
}

/** The form filled from a saved revision. */
export function formFromRevision(revision: RevisionDraft): SubmitForm {
  const { conditions } = revision;
  return {
    name: revision.name,
    synonyms: revision.synonyms.join('\n'),
    formula: revision.formula,
    structureFormat: revision.structureFormat ?? 'smiles',
    structure: revision.structure ?? '',
    casRn: revision.casRn ?? '',
    ionizationEnergyEv: numberText(conditions.ionizationEnergyEv ?? 70),
    instrumentType: conditions.instrumentType ?? '',
    inlet: conditions.inlet ?? '',
    sourceTemperatureC: numberText(conditions.sourceTemperatureC),
    column: conditions.column ?? '',
    scanFromMz: numberText(conditions.scanRange?.fromMz),
    scanToMz: numberText(conditions.scanRange?.toMz),
    retentionIndex: numberText(revision.retentionIndex?.value),
    retentionIndexColumn: columnClass(revision.retentionIndex?.column),
    sampleNotes: revision.sampleNotes,
    changeNote: revision.changeNote,
    peaksText: peaksToText(revision.peaks),
  };
}

/** A number field: empty → undefined, anything else → Number (NaN lets the schema name the field). */
function numberOrUndefined(text: string): number | undefined {
  const trimmed = text.trim();
  return trimmed === '' ? undefined : Number(trimmed);
}

function textOrUndefined(text: string): string | undefined {
  const trimmed = text.trim();
  return trimmed === '' ? undefined : trimmed;
}

/**
 * The body of `POST /entries` / `PATCH /revisions/:id` before validation: optional fields left out
 * when empty, the peaks as parsed from the text area (empty when the text does not parse).
 */
export function toRevisionInput(form: SubmitForm, peaks: PeakList | null): Record<string, unknown> {
  const from = numberOrUndefined(form.scanFromMz);
  const to = numberOrUndefined(form.scanToMz);
  const conditions = Object.fromEntries(
    Object.entries({
      ionizationEnergyEv: numberOrUndefined(form.ionizationEnergyEv) ?? 70,
      instrumentType: textOrUndefined(form.instrumentType),
      inlet: textOrUndefined(form.inlet),
      sourceTemperatureC: numberOrUndefined(form.sourceTemperatureC),
      column: textOrUndefined(form.column),
      scanRange: from === undefined && to === undefined ? undefined : { fromMz: from, toMz: to },
    }).filter(([, value]) => value !== undefined),
  );
  const structure = form.structure.trim() === '' ? null : form.structure;
  const riValue = numberOrUndefined(form.retentionIndex);
  return {
    name: form.name,
    synonyms: form.synonyms
      .split('\n')
      .map((line) => line.trim())
      .filter((line) => line !== ''),
    formula: form.formula,
    structure,
    structureFormat: structure === null ? null : form.structureFormat,
    casRn: textOrUndefined(form.casRn) ?? null,
    peaks: peaks ?? [],
    conditions,
    retentionIndex: riValue === undefined ? null : { value: riValue, column: form.retentionIndexColumn },
    sampleNotes: form.sampleNotes,
    changeNote: form.changeNote,
  };
}
