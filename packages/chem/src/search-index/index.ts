export * from './search-options';
export * from './spectrum-index';
export * from './synthetic-library';
