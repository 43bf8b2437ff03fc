export { isotopeCluster } from './isotope-cluster';
export type { ClusterPeak, IsotopeClusterOptions } from './isotope-cluster';
export { elementDistribution, convolve } from './nominal-distribution';
export type { NominalDistribution } from './nominal-distribution';
