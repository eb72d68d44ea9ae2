// Writes samples/loads/knuckle-spindle-stress.csv: the nominal bending stress at the spindle
// fillet of a tractor's front-axle steering knuckle over one working day (yard, road, field
// headlands), as a strain-gauge logger behind the fillet would record it after calibration to
// the net-section bending stress M c / I: the static wheel load, road and field bumps, ten
// start-stop manoeuvres with a loader on the front and two potholes in the yard (the kerb strike
// is a check of its own).
//
// INVENTED DATA for the fatigue-notes demo: the profile, bumps, start-stops and potholes are made up.
// The generator is deterministic (seeded PRNG), so the file and the note's numbers do not change.
// Run: node samples/loads/make-knuckle-history.mjs
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const SEED = 20261202;
const STATIC = 117; // MPa: static front wheel load times the spindle arm, at the fillet (invented)
const SAMPLES = 2400; // one reading per second of work, resampled to peaks (invented)

/** mulberry32: a small, well-known 32-bit seeded generator. */
function mulberry32(a) {
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const rnd = mulberry32(SEED);
const rows = ['S_fillet_MPa'];
for (let i = 0; i < SAMPLES; i++) {
  let s = STATIC;
  // Road and field bumps: up to +-45 % of the static load.
  s += STATIC * 0.45 * (2 * rnd() - 1);
  // Ten start-stop manoeuvres with a full loader bucket: the front wheel load rises to 2.4 times static.
  if (i % 240 === 120) s = STATIC * (2.2 + 0.2 * rnd());
  if (i % 240 === 121) s = STATIC * (0.3 + 0.1 * rnd());
  // Two potholes in the yard: the wheel drops and lands (3.1 times static, then 0.2 times).
  if (i === 700 || i === 1900) s = STATIC * 3.1;
  if (i === 701 || i === 1901) s = STATIC * 0.2;
  rows.push(s.toFixed(1));
}
const here = dirname(fileURLToPath(import.meta.url));
writeFileSync(join(here, 'knuckle-spindle-stress.csv'), `${rows.join('\n')}\n`);
