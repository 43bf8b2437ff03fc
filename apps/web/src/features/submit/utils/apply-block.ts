import { formatFormula, parseFormula } from '@ionfolio/chem';
import type { UploadedBlock } from '../api/upload-spectrum';
import { peaksToText, type SubmitForm } from './form-state';

function normalisedFormula(text: string): string {
  try {
    return formatFormula(parseFormula(text));
  } catch {
    return text.trim();
  }
}

/**
 * The form after taking a spectrum from an uploaded file: its peaks always, and its name, formula,
 * CAS RN and conditions where the file has them and the field is still empty (typed text wins).
 * Returns the labels of the fields it filled, to tell the person.
 */
export function applyBlock(form: SubmitForm, block: UploadedBlock): { form: SubmitForm; filled: string[] } {
  const next: SubmitForm = { ...form, peaksText: peaksToText(block.peaks) };
  const filled = ['peaks'];
  const fill = (key: keyof SubmitForm, value: string | null | undefined, label: string, isEmpty = next[key].trim() === '') => {
    if (value === null || value === undefined || value.trim() === '' || !isEmpty || value === next[key]) return;
    (next as Record<keyof SubmitForm, string>)[key] = value;
    filled.push(label);
  };
  fill('name', block.title, 'name');
  fill('formula', block.formula ? normalisedFormula(block.formula) : null, 'formula');
  fill('casRn', block.casRn, 'CAS RN');
  // The ionization energy field starts at 70; a file that states its energy replaces that default.
  fill(
    'ionizationEnergyEv',
    block.ionizationEnergyEv === null || block.ionizationEnergyEv === undefined ? null : String(block.ionizationEnergyEv),
    'ionization energy',
    form.ionizationEnergyEv.trim() === '' || form.ionizationEnergyEv.trim() === '70',
  );
  fill('inlet', block.inlet, 'inlet');
  fill('instrumentType', block.spectrometerType, 'instrument type');
  fill(
    'retentionIndex',
    block.retentionIndex === null || block.retentionIndex === undefined ? null : String(block.retentionIndex),
    'retention index',
  );
  return { form: next, filled };
}
