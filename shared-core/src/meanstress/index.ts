export * as morrow from './morrow';
export { estimateSigmaFPrimeSteel, MORROW_SOURCE, SIGMA_F_PRIME_OFFSET_STEEL } from './morrow';
export * as swt from './swt';
export { SWT_SOURCE } from './swt';
export * as walker from './walker';
export {
  defaultWalkerGamma,
  WALKER_GAMMA_ALUMINIUM,
  WALKER_GAMMA_SOURCE,
  WALKER_SOURCE,
  walkerGammaSteel,
} from './walker';
