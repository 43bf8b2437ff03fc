export { readMolecularIon } from './read-molecular-ion';
export type { MolecularIonReading, ReadMolecularIonOptions } from './read-molecular-ion';
export type { CarbonRange } from './carbon-range';
