// Design studies: evenly spaced values, roots by scan and Brent's method, and
// the sensitivity of net heat to emissivities and temperatures.
export { evenlySpaced } from './scan';
export { brentRoot, type RootOutcome, type RootTolerance } from './brent';
export { ROOT_RELATIVE_TOLERANCE, rootsByScan, type RootsOutcome } from './roots';
export {
  netHeatSensitivity,
  type SensitivityBase,
  type SensitivityInput,
  type SensitivityOutcome,
  type SensitivityParameter,
} from './sensitivity';
