export { checkRevision } from './check-revision';
export type { CheckRevisionInput } from './check-revision';
export type { CheckResult, CheckStatus } from './check-result';
export { CLUSTER_TOLERANCE } from './cluster-checks';
export { BACKGROUND_IONS, BACKGROUND_MIN_REL_INTENSITY, PEAK_COUNT_LIMITS } from './spectrum-checks';
