import { isApiError } from '../../../lib/api-error';

/** Problems by field path (`formula`, `conditions.ionizationEnergyEv`, `peaks.3.0`). */
export type FieldErrors = { path: string; message: string }[];

type IssueLike = { path?: unknown; message?: unknown };

function pathText(path: unknown): string {
  if (Array.isArray(path)) return path.map(String).join('.');
  return typeof path === 'string' ? path : '';
}

/** Zod issues (from the form's own validation) as field errors. */
export function fieldErrorsFromIssues(issues: readonly IssueLike[]): FieldErrors {
  return issues.flatMap((issue) =>
    typeof issue.message === 'string' ? [{ path: pathText(issue.path), message: issue.message }] : [],
  );
}

/** The `details` of a 400 VALIDATION answer as field errors (the API sends dot-joined paths). */
export function fieldErrorsFromApi(error: unknown): FieldErrors {
  if (!isApiError(error) || error.code !== 'VALIDATION' || !Array.isArray(error.details)) return [];
  return fieldErrorsFromIssues(error.details as IssueLike[]);
}

/** The messages for one field and everything under it (`peaks` also takes `peaks.3.0`). */
export function errorsFor(errors: FieldErrors, field: string): string[] {
  return errors.filter((e) => e.path === field || e.path.startsWith(`${field}.`)).map((e) => e.message);
}

/** What the form calls each field, for the list of problems above the buttons. */
export const fieldLabels: Record<string, string> = {
  name: 'Name',
  synonyms: 'Synonyms',
  formula: 'Formula',
  structure: 'Structure',
  structureFormat: 'Structure',
  casRn: 'CAS RN',
  peaks: 'Peaks',
  conditions: 'Conditions',
  'conditions.ionizationEnergyEv': 'Ionization energy',
  'conditions.instrumentType': 'Instrument type',
  'conditions.inlet': 'Inlet',
  'conditions.sourceTemperatureC': 'Source temperature',
  'conditions.column': 'Column',
  'conditions.scanRange': 'Scan range',
  retentionIndex: 'Retention index',
  sampleNotes: 'Sample notes',
  changeNote: 'Change note',
  lockVersion: 'Lock version',
};

/** The label of a field path: the longest known prefix (`peaks.3.0` → `Peaks`). */
export function fieldLabel(path: string): string {
  const parts = path.split('.');
  for (let n = parts.length; n > 0; n -= 1) {
    const label = fieldLabels[parts.slice(0, n).join('.')];
    if (label) return label;
  }
  return path === '' ? 'Form' : path;
}
