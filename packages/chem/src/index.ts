// The sole public entry of @ionfolio/chem. Each topic folder owns its own index.ts.
export * from './types';
export * from './errors/chem-error';
export * from './peak-list';
export * from './elements';
export * from './formula';
export * from './isotopes';
export * from './jcamp';
export * from './fragments';
export * from './spectrum';
export * from './similarity';
export * from './search-index';
export * from './suggest';
export * from './reading';
export * from './checks';
