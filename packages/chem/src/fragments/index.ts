export { fragmentNotes } from './fragment-notes';
export type { FragmentNote, FragmentNotesOptions } from './fragment-notes';
export { COMMON_IONS, COMMON_LOSSES, FRAGMENT_SOURCE } from './fragment-table';
export type { FragmentAlternative, IonEntry, LossEntry } from './fragment-table';
