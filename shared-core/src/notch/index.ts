export { crossHoleKt } from './crossHole';
export { fatigueNotchFactor, type KfSymbol, meanStressNotchFactor } from './fatigueFactor';
export { grooveKt } from './groove';
export { neuberConstant, neuberSensitivity, type StressKind } from './neuber';
export { familyNotchSensitivity, type NotchSensitivityModel } from './notchSensitivity';
export { ALUMINIUM_A_MM, type MaterialClass, noNotchData, petersonSensitivity } from './peterson';
export { plateHoleKt } from './plateHole';
export {
  type CutoutPoint,
  type CutoutPointKey,
  cutoutEnds,
  cutoutPoint,
  ellipseBoundaryStress,
  ellipseRadiusOfCurvature,
  governingCutoutPoint,
  shellCutoutKt,
} from './shellCutout';
export { SHELL_PARAMETER_LIMIT, SHELL_POISSON, shellParameter } from './shellParameter';
export { type ShaftLoad, shoulderFilletKt } from './shoulderFillet';
