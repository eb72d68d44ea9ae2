/**
 * No result from a value that cannot be physical (issue 11, item 6), and no `pass` that hides
 * a finite life (item 8). The limits and their grounds are in shared-core/src/language/
 * plausibility.ts and docs/methods.md; each case below names why the value cannot be.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { evaluateNote } from '../../shared-core/src';
import { check, si } from './helpers';

const SHAFT = [
  'Sut = 630 MPa',
  'Sy = 530 MPa',
  'material-family: steel',
  'surface: machined',
  'temp = 20 degC',
  'reliability = 0.99',
  'd = 35 mm',
  'feature: none',
  'M_a = 180 N*m',
  'criterion: goodman',
  'require: n_f >= 1.5',
];

/** The shaft with lines replaced (by their name) or added. */
function shaft(changes: Record<string, string | null>, extra: string[] = []): string[] {
  const out: string[] = [];
  for (const l of SHAFT) {
    const key = l.split(/\s*[=:]/)[0];
    if (key in changes) {
      if (changes[key] !== null) out.push(changes[key]!);
    } else out.push(l);
  }
  return [...out, ...extra];
}

function withheld(lines: string[], code: string) {
  const c = check(lines);
  const d = c.diagnostics.find((x) => x.code === code && x.severity === 'error');
  expect(d, `${code}; got ${c.diagnostics.map((x) => `${x.code}/${x.severity}`).join(' ')}`).toBeDefined();
  expect(c.values.n_f).toBeUndefined();
  expect(c.values.N_f).toBeUndefined();
  expect(c.status).toBe('error');
  expect(c.requirements[0].met).toBeNull();
  return { c, d: d! };
}

describe('values no engineering part can have: errors that withhold every result', () => {
  it('Sut = 63000 MPa: beyond any metal (music wire, the strongest steel, reaches 3.09 GPa: Shigley 9th ed. Table 10-4)', () => {
    const { d } = withheld(shaft({ Sut: 'Sut = 63000 MPa' }), 'absurd-value');
    expect(d.range.start.line).toBe(1);
    expect(d.message).toContain('Table 10-4');
  });
  it('Sut = 4 GPa stated in ksi (580 ksi): the same limit in US units', () =>
    withheld(shaft({ Sut: 'Sut = 580 ksi', Sy: 'Sy = 500 ksi' }), 'absurd-value'));
  it('a 45 m shaft (the largest forged shafts are one to two metres across, from memory)', () =>
    withheld(shaft({ d: 'd = 45 m' }), 'absurd-value'));
  it('Sy above the library Sut (aisi-1018-cd: Sut 440 MPa, Shigley Table A-20): yield cannot exceed the ultimate', () =>
    withheld(
      shaft({ Sut: 'material: aisi-1018-cd', Sy: 'Sy = 500 MPa', 'material-family': null }),
      'sy-above-sut',
    ));
  it('Se_prime at or above Sut (Shigley Fig. 6-17: endurance ratio at most about 0.6)', () =>
    withheld(shaft({}, ['Se_prime = 700 MPa']), 'absurd-value'));
  it('f above 1: f Sut is the strength at 10^3 cycles, below Sut (Shigley Sec. 6-7)', () =>
    withheld(shaft({}, ['f = 1.2']), 'absurd-value'));
  it('q above 1 and Kf above Kt (q = (Kf - 1)/(Kt - 1) between 0 and 1, Shigley Eq. 6-31)', () => {
    withheld(shaft({}, ['q = 1.3']), 'absurd-value');
    withheld(shaft({}, ['Kt = 1.5', 'Kf = 1.8']), 'absurd-value');
  });
  it('a plate hole as wide as the plate', () =>
    withheld(
      shaft({ d: 'W = 40 mm', feature: 'feature: plate-hole', M_a: 'F_a = 10 kN' }, [
        't = 10 mm',
        'd_hole = 40 mm',
      ]),
      'absurd-value',
    ));
  it('a shell wall thicker than its bore, and a cutout wider than the circumference', () => {
    const shell = (t: string, wc: string) =>
      shaft({ d: 'D_i = 100 mm', feature: 'feature: shell-cutout', M_a: 'p_max = 5 MPa' }, [
        'p_min = 0 MPa',
        'shell: cylinder',
        t,
        wc,
        'h_c = 20 mm',
      ]);
    withheld(shell('t = 120 mm', 'w_c = 20 mm'), 'absurd-value');
    withheld(shell('t = 5 mm', 'w_c = 400 mm'), 'absurd-value');
  });
  it('a notch radius larger than the part', () =>
    withheld(shaft({ feature: 'feature: shoulder-fillet' }, ['D = 42 mm', 'r = 43 mm']), 'absurd-value'));
  it('an unknown library key and an unknown family word withhold the results too', () => {
    withheld(shaft({ 'material-family': 'material: aisi-4140-qt999' }), 'unknown-material');
    withheld(shaft({ 'material-family': 'material-family: aluminum' }), 'unknown-option-value');
  });
});

describe('merely unusual values stay warnings', () => {
  it('Sut = 2.8 GPa (fine spring wire reaches it: Shigley Table 10-4): a warning, the check evaluates', () => {
    const c = check(shaft({ Sut: 'Sut = 2800 MPa' }));
    const d = c.diagnostics.find((x) => x.code === 'absurd-value');
    expect(d?.severity).toBe('warning');
    expect(c.values.n_f).toBeDefined();
  });
  it('a 4 m shaft: a warning, the check evaluates', () => {
    const c = check(shaft({ d: 'd = 4 m', M_a: 'M_a = 5e7 N*m' }));
    expect(c.diagnostics.find((x) => x.code === 'absurd-value')?.severity).toBe('warning');
    expect(c.values.n_f).toBeDefined();
  });
});

describe('property: no check passes with a value flagged impossible', () => {
  it('random strengths and sizes: an absurd-value error never comes with results or a pass', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 1e5, noNaN: true }),
        fc.double({ min: 1, max: 1e5, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e5, noNaN: true }),
        (sut, sy, dmm) => {
          const c = check(
            shaft({ Sut: `Sut = ${sut} MPa`, Sy: `Sy = ${sy} MPa`, d: `d = ${dmm} mm`, M_a: 'M_a = 1 N*m' }),
          );
          const impossible = c.diagnostics.some(
            (x) => x.severity === 'error' && (x.code === 'absurd-value' || x.code === 'sy-above-sut'),
          );
          if (impossible) {
            expect(c.status).not.toBe('pass');
            expect(c.values.n_f).toBeUndefined();
          }
          if (sy > sut) expect(impossible).toBe(true);
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('a pass that hides a finite life', () => {
  // Budynas & Nisbett, Shigley's MED 9th ed., Example 6-2 (from memory): 1050 HR, Sut = 90 kpsi,
  // Se' = 45 kpsi, f = 0.86, a completely reversed 55 kpsi gives a life of about 77 500 cycles
  // (Eq. 6-16: N = (sigma/a)^(1/b), a = (f Sut)^2/Se, b = -(1/3) log10(f Sut/Se)).
  const lines = (require: string, extra: string[] = []) => [
    'Sut = 90 ksi',
    'Sy = 49.5 ksi',
    'material-family: steel',
    'Se = 45 ksi',
    'f = 0.86',
    'feature: none',
    'sigma_a = 55 ksi',
    'criterion: goodman',
    ...extra,
    require,
  ];
  const a = (0.86 * 90) ** 2 / 45;
  const b = -Math.log10((0.86 * 90) / 45) / 3;
  const life = (55 / a) ** (1 / b);
  it('n_f = 45/55 < 1 with only n_y required: warning, and the life is finite (Eq. 6-16)', () => {
    const c = check(lines('require: n_y >= 0.85'));
    expect(c.status).toBe('pass');
    expect(si(c, 'n_f')).toBeCloseTo(45 / 55, 10);
    expect(si(c, 'N_f') / life).toBeCloseTo(1, 6);
    expect(Math.abs(life - 77500) / 77500).toBeLessThan(0.01);
    const d = c.diagnostics.find((x) => x.code === 'hidden-finite-life');
    expect(d?.severity).toBe('warning');
    expect(d?.message).toContain('77614');
  });
  it('the quick fix merges `N_f >= 1e6` into the require line, and the check then fails', () => {
    const body = lines('require: n_y >= 0.85');
    const text = ['```fatigue pin', ...body, '```', ''].join('\n');
    const c = evaluateNote(text).checks[0];
    const edit = c.diagnostics.find((x) => x.code === 'hidden-finite-life')!.fixes![0].edits[0];
    const rows = text.split('\n');
    const row = rows[edit.range.start.line];
    rows[edit.range.start.line] =
      row.slice(0, edit.range.start.character) + edit.newText + row.slice(edit.range.end.character);
    expect(rows[edit.range.start.line]).toBe('require: n_y >= 0.85, N_f >= 1e6');
    const fixed = evaluateNote(rows.join('\n')).checks[0];
    expect(fixed.status).toBe('fail');
    expect(fixed.diagnostics.some((x) => x.code === 'hidden-finite-life')).toBe(false);
  });
  it('with a required life N the fix asks for N_f >= N', () => {
    const c = check(lines('require: n_y >= 0.85', ['N = 1e5']));
    // n_f is against S_f = a N^b at N = 1e5 (Eq. 6-13): 53.9 kpsi < 55 kpsi, a life below N.
    expect(si(c, 'n_f')).toBeCloseTo((a * 1e5 ** b) / 55, 8);
    expect(si(c, 'n_f')).toBeLessThan(1);
    const d = c.diagnostics.find((x) => x.code === 'hidden-finite-life');
    expect(d?.message).toContain('shorter than the required N');
    expect(d?.fixes?.[0].edits[0].newText).toBe(', N_f >= N');
  });
  it('a requirement on N_f, an infinite life or n_f >= 1 leave no warning', () => {
    const withLife = check(lines('require: n_y >= 0.85, N_f >= 5e4'));
    expect(withLife.diagnostics.some((x) => x.code === 'hidden-finite-life')).toBe(false);
    const safe = check(
      lines('require: n_y >= 0.85').map((l) => (l.startsWith('sigma_a') ? 'sigma_a = 30 ksi' : l)),
    );
    expect(safe.diagnostics.some((x) => x.code === 'hidden-finite-life')).toBe(false);
  });
});

describe('stated factors beyond their published bounds withhold the results (each bound named)', () => {
  // Kf = 1 + q (Kt - 1), Kt >= 1, 0 <= q <= 1 (Shigley's MED Eq. 6-32): Kf >= 1; a smaller
  // value credits the notch with strength, an unconservative factor.
  for (const line of ['Kf = 0.5', 'Kf = 1e-300', 'Kt = 0.6']) {
    it(`${line}: absurd-value error on its line, no safety factor`, () => {
      const { c } = withheld(shaft({ feature: null }, [line]), 'absurd-value');
      expect(c.values.n_f).toBeUndefined();
    });
  }
  it('Kfs = 0.1 in a shaft under torque: error, no safety factor', () => {
    const { c } = withheld(shaft({ feature: null }, ['T_a = 100 N*m', 'Kfs = 0.1']), 'absurd-value');
    expect(c.values.n_f).toBeUndefined();
  });
  // Marin factors: ka <= 1 (Table 6-2, capped), kb <= 1.11 (Eq. 6-20 at d = 2.79 mm), kc <= 1
  // (Eq. 6-26), kd <= 1.025 (Eq. 6-27's largest value, near 263 degF), ke <= 1 (Table 6-5).
  for (const line of ['ka = 3', 'kb = 2', 'kc = 1.2', 'kd = 1.1', 'ke = 1.05', 'kmisc = 10']) {
    it(`${line}: absurd-value error, results withheld`, () => {
      const { c } = withheld(shaft({}, [line]), 'absurd-value');
      expect(c.values.n_f).toBeUndefined();
    });
  }
  it('values inside the bounds stay: kb = 1.1 (Eq. 6-20 at 3 mm), kd = 1.02 (Eq. 6-27 at 200 degF)', () => {
    const c = check(shaft({}, ['kb = 1.1', 'kd = 1.02']));
    expect(c.diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    expect(si(c, 'kb')).toBe(1.1);
  });
  it('kmisc = 1.3 (a claimed benefit) is a warning that asks for test data, not an error', () => {
    const c = check(shaft({}, ['kmisc = 1.3']));
    const d = c.diagnostics.find((x) => x.code === 'absurd-value');
    expect(d?.severity).toBe('warning');
    expect(d?.message).toMatch(/fatigue tests/);
    expect(c.values.n_f).toBeDefined();
  });
});
