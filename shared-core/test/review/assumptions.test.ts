/** The assumptions register: what the evaluation took by default, with its line (no outside values: a view of records). */
import { describe, expect, it } from 'vitest';
import { evaluateNote } from '../../src';
import { assumptionsRegister, isAssumptionCode } from '../../src/review';

const NOTE = [
  '# Note', //                       line 1
  '', //                             line 2
  '```fatigue plain', //             line 3
  'Sut = 630 MPa', //                line 4
  'Sy = 530 MPa', //                 line 5
  'surface: machined', //            line 6
  'd = 30 mm', //                    line 7
  'M_a = 200 N*m', //                line 8
  'criterion: goodman', //           line 9
  '```', //                          line 10
  '',
  '```fatigue stated_all', //        line 12
  'material: aisi-1045-cd',
  'surface: machined',
  'temp = 20 degC',
  'reliability = 0.99',
  'kmisc = 1',
  'rotation: rotating',
  'load-line: proportional',
  'd = 30 mm',
  'feature: none',
  'M_a = 200 N*m',
  'M_m = 0 N*m',
  'criterion: goodman',
  '```',
  '',
].join('\n');

describe('assumptionsRegister', () => {
  const result = evaluateNote(NOTE);
  const register = assumptionsRegister(result, NOTE);
  const plain = register.filter((e) => e.check === 'plain');

  it('lists the defaulted values with their assumption and merges the diagnostic that announces each', () => {
    const kd = plain.find((e) => e.name === 'kd');
    expect(kd).toMatchObject({
      kind: 'default-value',
      display: '1',
      codes: ['defaulted-temperature'],
      checkLine: 3,
    });
    expect(kd?.text).toMatch(/room temperature/);
    const ke = plain.find((e) => e.name === 'ke');
    expect(ke?.codes).toEqual(['defaulted-reliability']);
    expect(plain.find((e) => e.name === 'kmisc')?.kind).toBe('default-value');
    // Merged: the temperature diagnostic is not listed a second time on its own.
    expect(plain.filter((e) => e.codes.includes('defaulted-temperature'))).toHaveLength(1);
  });

  it('lists the diagnostics of defaults that are not values, with their line', () => {
    const load = plain.find((e) => e.codes.includes('defaulted-load'));
    expect(load).toMatchObject({ kind: 'diagnostic', line: 8 });
    expect(plain.some((e) => e.codes.includes('assumed-steel'))).toBe(true);
  });

  it('lists the options left to their default when the check used them, only with the text', () => {
    expect(plain.filter((e) => e.kind === 'default-option').map((e) => e.name)).toEqual([
      'rotation',
      'load-line',
    ]);
    expect(assumptionsRegister(result).some((e) => e.kind === 'default-option')).toBe(false);
  });

  it('has nothing for a check that states everything (material from the library, every option used)', () => {
    const all = register.filter((e) => e.check === 'stated_all');
    expect(all.map((e) => `${e.kind}:${e.name ?? e.codes.join(',')}`)).toEqual([]);
  });

  it('is plain data (JSON round trip) sorted by line within a check', () => {
    expect(JSON.parse(JSON.stringify(register))).toEqual(register);
    const lines = plain.map((e) => e.line);
    expect([...lines].sort((a, b) => a - b)).toEqual(lines);
  });

  it('recognises assumption codes', () => {
    expect(isAssumptionCode('defaulted-load')).toBe(true);
    expect(isAssumptionCode('assumed-steel')).toBe(true);
    expect(isAssumptionCode('no-criterion')).toBe(true);
    expect(isAssumptionCode('wrong-dimension')).toBe(false);
  });
});
