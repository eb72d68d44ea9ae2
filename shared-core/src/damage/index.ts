export {
  cyclesToFailure,
  type DamageContributor,
  type DamageCycle,
  equivalentCycles,
  MINER_SOURCE,
  MinerAccumulator,
  type MinerResult,
  type MinerRule,
  minerDamage,
  N1_LOW_CYCLE,
  repeatsToFailure,
  type SnLine,
} from './miner';
