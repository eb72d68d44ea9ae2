// Writes samples/loads/outrigger-box-stress.csv: the nominal stress range history in the bottom
// flange of a mobile crane's outrigger box, at the end of the stiffener welded under the jack
// housing, over one working shift of pick-and-place lifts: the crane slews each load over the
// outrigger and back, so the flange stress rises and falls with the load and the slewing angle,
// the hook bounces at lift-off, and the outrigger sits at a small dead-load stress between lifts.
//
// INVENTED DATA for the fatigue-notes demo: the lifts, loads and noise are made up. The generator
// is deterministic (seeded PRNG), so the file and the note's numbers do not change.
// Run: node samples/loads/make-outrigger-history.mjs
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const SEED = 20261202;
const RATE = 5; // samples per second
const LIFTS = 24; // lifts in the shift
const LIFT_TIME = 60; // s per lift: lift off, slew over, set down, slew back
const DEAD = -8; // MPa: the box's own weight and the jack preload (compression in the flange)
const FULL = 95; // MPa: the flange stress of the rated load slewed right over the outrigger (invented)

/** mulberry32: a small, well-known 32-bit seeded generator. */
function mulberry32(a) {
  return () => {
    a |= 0;
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
const rnd = mulberry32(SEED);
/** Standard normal by Box-Muller. */
function gauss() {
  const u = Math.max(rnd(), 1e-12);
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rnd());
}

const lines = [
  '# mobile crane MC-40, outrigger box front left, strain gauge SG4 on the bottom flange at the stiffener end',
  '# logger: 5 Hz, one shift of 24 lifts; invented data for the fatigue-notes demo (make-outrigger-history.mjs)',
  'time_s,sigma_MPa',
];
const dt = 1 / RATE;
let t = 0;
for (let lift = 0; lift < LIFTS; lift++) {
  const load = 0.35 + 0.65 * rnd(); // fraction of the rated load
  for (let i = 0; i < LIFT_TIME * RATE; i++) {
    const s = i * dt;
    // Slewing over the outrigger and back: the share of the load on this outrigger.
    const share =
      s < 5
        ? 0.2
        : s < 30
          ? 0.2 + 0.8 * Math.sin((Math.PI * (s - 5)) / 50) ** 2
          : s < 55
            ? 0.2 + 0.8 * Math.sin((Math.PI * (55 - s)) / 50) ** 2
            : 0;
    const bounce = s >= 5 && s < 9 ? 0.12 * Math.exp(-(s - 5)) * Math.sin(2 * Math.PI * 1.5 * (s - 5)) : 0;
    const lifted = s >= 5 && s < 55 ? load : 0;
    const sigma = DEAD + FULL * lifted * (share + bounce) + 0.6 * gauss();
    lines.push(`${t.toFixed(1)},${sigma.toFixed(2)}`);
    t += dt;
  }
}
const out = join(dirname(fileURLToPath(import.meta.url)), 'outrigger-box-stress.csv');
writeFileSync(out, `${lines.join('\n')}\n`);
console.log(`wrote ${out}: ${lines.length - 3} rows`);
