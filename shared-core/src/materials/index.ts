export type { CyclicProperties, Material, MaterialClass } from './library';
export { editDistance, findMaterial, MATERIALS, nearestMaterialKeys } from './library';
