/**
 * The time budget of history reading (issue 7): set by the language server through
 * `EvaluateOptions.historyBudgetMs`, absent in the command line.
 */
import { describe, expect, it } from 'vitest';
import { evaluateNote, type HistoryChunkReader } from '../../src/index';
import { budgetedReader } from '../../src/language/historyBudget';

/** A reader of `chunks` chunks that advances a fake clock by `msPerChunk` per chunk. */
function slowReader(chunks: string[], clock: { t: number }, msPerChunk: number) {
  let delivered = 0;
  const reader: HistoryChunkReader = {
    read(_path, onChunk) {
      for (const c of chunks) {
        clock.t += msPerChunk;
        delivered++;
        onChunk(c);
      }
      return { ok: true };
    },
  };
  return { reader, delivered: () => delivered };
}

describe('budgetedReader', () => {
  it('stops at the first chunk past the budget and answers history-time-budget', () => {
    const clock = { t: 0 };
    const { reader, delivered } = slowReader(Array(1000).fill('1\n'), clock, 10);
    const got: Array<string | Uint8Array> = [];
    const r = budgetedReader(reader, 100, () => clock.t).read('h.csv', (c) => got.push(c));
    expect(r).toMatchObject({ ok: false, code: 'history-time-budget' });
    // 10 chunks take 100 ms (within the budget); the 11th is past it and is not passed on.
    expect(got.length).toBe(10);
    expect(delivered()).toBe(11);
  });

  it('shares the budget between the passes of one check', () => {
    const clock = { t: 0 };
    const { reader } = slowReader(Array(8).fill('1\n'), clock, 10);
    const b = budgetedReader(reader, 100, () => clock.t);
    expect(b.read('h.csv', () => {})).toEqual({ ok: true });
    expect(b.read('h.csv', () => {})).toMatchObject({ ok: false, code: 'history-time-budget' });
  });

  it('passes other errors of the reader and of the consumer through', () => {
    const failing: HistoryChunkReader = {
      read: () => ({ ok: false, code: 'history-missing', message: 'x' }),
    };
    expect(budgetedReader(failing, 100).read('h.csv', () => {})).toMatchObject({ code: 'history-missing' });
    const clock = { t: 0 };
    const { reader } = slowReader(['a'], clock, 1);
    expect(() =>
      budgetedReader(reader, 100, () => clock.t).read('h.csv', () => {
        throw new Error('consumer bug');
      }),
    ).toThrow('consumer bug');
  });
});

describe('historyBudgetMs in a damage check', () => {
  const lines = [
    '```fatigue h',
    'method: damage',
    'Sut = 600 MPa',
    'Sy = 450 MPa',
    'Se_prime = 200 MPa',
    'f = 0.9',
    'ka = 1',
    'kb = 1',
    'kc = 1',
    'kd = 1',
    'ke = 1',
    'feature: none',
    'criterion: goodman',
    'history: loads/long.csv',
    'history-column: stress',
    'history-load: stress',
    'history_scale = 50 MPa',
    '```',
    '',
  ];
  const text = lines.join('\n');
  /** A history that takes about 1 ms of real time per chunk to read. */
  const busy: HistoryChunkReader = {
    read(_p, onChunk) {
      onChunk('time [s],stress\n');
      for (let i = 0; i < 2000; i++) {
        const t0 = performance.now();
        while (performance.now() - t0 < 1) {
          /* a slow disk */
        }
        onChunk(`${i},${i % 2 ? 1 : -1}\n`);
      }
      return { ok: true };
    },
  };

  it('with a budget: an error history-time-budget on the history line, soon', () => {
    const t0 = performance.now();
    const r = evaluateNote(text, { histories: busy, historyBudgetMs: 50 });
    expect(performance.now() - t0).toBeLessThan(1500);
    const d = r.diagnostics.find((x) => x.code === 'history-time-budget');
    expect(d, r.diagnostics.map((x) => x.code).join(' ')).toBeDefined();
    expect(d!.severity).toBe('error');
    expect(lines[d!.range.start.line]).toBe('history: loads/long.csv');
    expect(r.checks[0].status).toBe('error');
  });

  it('without one (the command line): the history is read to the end and counted', () => {
    const fast: HistoryChunkReader = {
      read(_p, onChunk) {
        onChunk('time [s],stress\n');
        for (let i = 0; i < 2000; i++) onChunk(`${i},${i % 2 ? 1 : -1}\n`);
        return { ok: true };
      },
    };
    const r = evaluateNote(text, { histories: fast });
    expect(r.diagnostics.map((x) => x.code)).not.toContain('history-time-budget');
    expect(r.checks[0].values.cycles_counted?.si).toBeGreaterThan(900);
  });
});
