export * from './validate-peaks';
export * from './base-peak';
export * from './merge-duplicate-mz';
export * from './apply-noise-threshold';
export * from './normalized-arrays';
export * from './normalize-spectrum';
