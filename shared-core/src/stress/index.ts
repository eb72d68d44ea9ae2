export { plateGrossStress, plateNetStress } from './plate';
export { axialStress, bendingStress, torsionStress } from './roundShaft';
export {
  lameCylinderHoopMax,
  lameCylinderLong,
  lameSphereTangentialMax,
  type ShellKind,
  shellStresses,
  THIN_WALL_LIMIT,
} from './thinShell';
export {
  AXIAL_LOAD_FACTOR,
  type EquivalentStresses,
  type EquivalentStressInput,
  equivalentStresses,
  pointEquivalentStresses,
} from './vonMises';
