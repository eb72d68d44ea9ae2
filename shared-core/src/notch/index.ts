export { crossHoleKt } from './crossHole';
export { fatigueNotchFactor, type KfSymbol, meanStressNotchFactor } from './fatigueFactor';
export { grooveKt } from './groove';
export { neuberConstant, neuberSensitivity, type StressKind } from './neuber';
export { type MaterialClass, petersonSensitivity } from './peterson';
export { plateHoleKt } from './plateHole';
export { ellipseBoundaryStress, shellCutoutKt } from './shellCutout';
export { type ShaftLoad, shoulderFilletKt } from './shoulderFillet';
