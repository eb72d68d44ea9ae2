// Writes samples/loads/ramp-hoist-moment.csv: the bending moment at the drum-hub fillet of the
// ferry-ramp hoist over one ramp operation (rest on the quay, raise, hold, lower, rest), as a
// strain-gauge telemetry logger on the rotating shaft would record it: a rotating shaft sees
// the rope pull as a bending moment that turns once per revolution.
//
// INVENTED DATA for the fatigue-notes demo: the profile, surges and noise are made up. The
// generator is deterministic (seeded PRNG), so the file and the note's numbers do not change.
// Run: node samples/loads/make-ramp-history.mjs
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const SEED = 20240611;
const RATE = 50; // samples per second
const DURATION = 90; // s
const PEAK = 1.6; // kN*m: rope pull times the bearing arm at the design load case (invented)

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

/** Rope pull (fraction of the design pull) and shaft speed (rev/s) at time t. */
function state(t) {
  if (t < 5) return { pull: 0.15, speed: 0 }; // ramp resting on the quay, rope pre-tension
  if (t < 35) {
    const s = t - 5;
    const surge = 0.3 * Math.exp(-s / 1.5) * Math.sin(2 * Math.PI * 1.2 * s); // start-up surge
    return { pull: (0.85 + (0.15 * s) / 30) * (1 + surge), speed: 0.5 };
  }
  if (t < 50) return { pull: 1.0, speed: 0 }; // held by the brake at the top
  if (t < 78) {
    const s = t - 50;
    const stop = t > 76 ? 0.25 * Math.sin(2 * Math.PI * 2 * (t - 76)) : 0; // stop jerk
    return { pull: 0.8 * (1 - (0.1 * s) / 28) * (1 + stop), speed: -0.45 };
  }
  return { pull: 0.15, speed: 0 };
}

const lines = [
  '# ramp hoist H2, drum shaft telemetry, channel 3: bending moment at the drum-hub fillet',
  '# logger: 50 Hz, decimal comma; invented data for the fatigue-notes demo (make-ramp-history.mjs)',
  'time [s];M_hub [kN*m]',
];
let angle = 0.4; // rad, shaft angle at the start
const dt = 1 / RATE;
for (let i = 0; i < DURATION * RATE; i++) {
  const t = i * dt;
  const { pull, speed } = state(t);
  angle += 2 * Math.PI * speed * dt;
  const m = PEAK * pull * Math.sin(angle) + 0.008 + 0.012 * PEAK * gauss();
  lines.push(`${t.toFixed(2).replace('.', ',')};${m.toFixed(4).replace('.', ',')}`);
}
const out = join(dirname(fileURLToPath(import.meta.url)), 'ramp-hoist-moment.csv');
writeFileSync(out, `${lines.join('\n')}\n`);
console.log(`wrote ${out}: ${DURATION * RATE} rows`);
