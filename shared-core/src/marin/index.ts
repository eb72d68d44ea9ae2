export type { LoadKind } from './load';
export { loadFactor } from './load';
export { miscFactor } from './miscellaneous';
export { normalQuantile, reliabilityFactor } from './reliability';
export type { RectangularSizeOptions, RoundSizeOptions, SizeLoad, UnitSystem } from './size';
export {
  equivalentDiameterRectangular,
  equivalentDiameterRound,
  sizeFactorRectangular,
  sizeFactorRound,
} from './size';
export type { SurfaceFinish } from './surface';
export { SURFACE_FINISHES, surfaceFactor } from './surface';
export { temperatureFactor } from './temperature';
