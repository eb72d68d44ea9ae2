/**
 * Welded details: S-N curves by detail class (EN 1993-1-9 detail categories, IIW FAT classes), the
 * corrections of the class (thickness, stress ratio, improvement), the stress at the detail
 * (hot-spot extrapolation, notch-stress classes, weld throat), partial factors, variable-amplitude
 * damage and the verification. Pure functions returning `Computed`; `methods/weld/` wires them into `method: weld`.
 */
export {
  type CatalogueClassResult,
  type CatalogueEntry,
  catalogueClass,
  type DetailParams,
  findDetail,
  stressTypeNotes,
  WELD_DETAILS,
} from './catalogue';
export {
  HOT_SPOT_SCHEMES,
  type HotSpotJoint,
  type HotSpotScheme,
  hotSpotClass,
  hotSpotStress,
  type NotchCriterion,
  notchStressClass,
} from './hotSpot';
export {
  FAT_SERIES,
  type ImprovementInput,
  type ImprovementMethod,
  type ImprovementResult,
  improvedClass,
} from './improvement';
export {
  type AssessmentConcept,
  type Consequence,
  loadFactor,
  type PartialFactorInput,
  resistanceFactor,
} from './partialFactors';
export {
  cutOffRange,
  enCurve,
  type IiwCurveOptions,
  type IiwEdition,
  iiwCurve,
  kneeRange,
  lifeKernel,
  N_C,
  N_LOW_END,
  scaleCurve,
  type WeldCurveResult,
  type WeldLoading,
  type WeldMaterial,
  type WeldSnCurve,
  type WeldStandard,
  type WeldStress,
  weldLife,
  weldStrengthAtLife,
} from './snCurve';
export * as weldSources from './sources';
export {
  blocksToLimit,
  cyclesToLimit,
  equivalentRange,
  permissibleDamage,
  type RangeCount,
  rangeSafetyFactor,
  WeldDamageAccumulator,
  type WeldDamageContributor,
  type WeldDamageOptions,
  type WeldDamageResult,
  weldDamage,
} from './spectrum';
export { enEffectiveRange, iiwStressRatioFactor, type ResidualCondition, stressRatio } from './stressRatio';
export {
  enSizeFactor,
  IIW_THICKNESS_EXPONENT,
  type IiwThicknessJoint,
  type IiwThicknessOptions,
  iiwThicknessFactor,
  statedThicknessFactorNotes,
} from './thickness';
export {
  type ThroatInput,
  throatClass,
  throatNormalRange,
  throatResultant,
  throatShearRange,
} from './throat';
export {
  constantAmplitudeSafetyFactor,
  damageUtilisation,
  enInteraction,
  iiwInteraction,
  rangeUtilisation,
  stressRangeLimit,
  type WeldStressType,
} from './verification';
