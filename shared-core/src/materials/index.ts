export {
  FAMILIES,
  FAMILY_MELT_SOURCE,
  FAMILY_WORDS,
  type FamilyInfo,
  familyOfClass,
  isFamily,
  type MaterialFamily,
} from './families';
export type { CyclicProperties, Material, MaterialClass } from './library';
export { editDistance, findMaterial, MATERIALS, nearestMaterialKeys } from './library';
