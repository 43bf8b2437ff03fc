export type { JcampSpectrum } from './jcamp-spectrum';
export { readJcamp } from './read-jcamp';
export { writeJcamp } from './write-jcamp';
export type { JcampWriteInput } from './write-jcamp';
