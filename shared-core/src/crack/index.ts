export {
  centreCrackFiniteWidth,
  constantGeometry,
  type GeometryFactor,
  geometryFactorAt,
  singleEdgeCrackFiniteWidth,
  TADA_HANDBOOK,
} from './geometry';
export {
  criticalCrackSize,
  inspectionInterval,
  KSI_SQRT_IN_IN_MPA_SQRT_M,
  PARIS_SOURCE,
  type ParisInput,
  parisConstantFromInch,
  parisConstantNotes,
  parisLife,
} from './paris';
