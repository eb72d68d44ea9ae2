export {
  lifeAtStress,
  SN_BASQUIN_SOURCE,
  SN_LIFE_SOURCE,
  SN_SHIGLEY_SOURCE,
  type SnLine,
  snLineFromBasquin,
  snLineThrough,
  strengthAtLife,
} from './basquin';
