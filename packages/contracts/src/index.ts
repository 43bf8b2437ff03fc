export * from './revision-content';
export * from './curation';
