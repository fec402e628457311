import { describe, expect, it } from 'vitest';
import { prepareSweep, sweepGaps, sweepRows } from '../../shared/charts/sweep-rows';
import { prepareTornado } from '../../shared/charts/tornado-rows';
import type { SweepOutput, TornadoOutput } from '../../shared/mechanics/sensitivity-schema';

// Exact by definition: 1 in = 25.4 mm; 1 lbf = 0.45359237 kg × 9.80665 m/s².
const MM_PER_IN = 25.4;
const N_PER_LBF = 0.45359237 * 9.80665;

const fail = (value: number, message: string) => ({ value, ok: false as const, error: { kind: 'geometry', message } });
const ok = (value: number, T: number | null, a: number) => ({ value, ok: true as const, values: { T, a } });

const sweep: SweepOutput = {
  input: { key: 'L', label: 'Boom length', quantity: 'length' },
  series: [
    { key: 'T', label: 'Tie tension', quantity: 'force' },
    { key: 'a', label: 'Tie angle', quantity: 'angle' },
  ],
  steps: [ok(1000, 500, 30), fail(2000, 'cannot close'), fail(3000, 'cannot close'), ok(4000, null, 20), fail(5000, 'too short'), ok(6000, 900, 10)],
};

describe('sweep rows for the charts', () => {
  it('converts an SI payload to the display system and leaves failed steps and missing values as gaps', () => {
    const rows = sweepRows(sweep, 'US');
    expect(rows.map((r) => r.x)).toEqual(sweep.steps.map((s) => expect.closeTo(s.value / MM_PER_IN, 9)));
    expect(rows[0]!.T).toBeCloseTo(500 / N_PER_LBF, 9);
    expect(rows[0]!.a).toBe(30); // degrees in both systems
    expect(rows[1]!.T).toBeNull();
    expect(rows[1]!.error).toBe('cannot close');
    expect(rows[3]!.T).toBeNull();
    expect(rows[3]!.error).toBeUndefined();
  });

  it('takes a payload already in the display system as it is, and converts one in the other system', () => {
    const asUs = sweepRows(sweep, 'US', 'US');
    expect(asUs.map((r) => r.x)).toEqual(sweep.steps.map((s) => s.value));
    const backToSi = sweepRows(sweep, 'SI', 'US');
    expect(backToSi[0]!.x).toBeCloseTo(1000 * MM_PER_IN, 6);
    expect(backToSi[0]!.T).toBeCloseTo(500 * N_PER_LBF, 6);
  });

  it('groups consecutive failed steps into one gap each, with the first message', () => {
    expect(sweepGaps(sweepRows(sweep, 'SI'))).toEqual([
      { from: 2000, to: 3000, message: 'cannot close' },
      { from: 5000, to: 5000, message: 'too short' },
    ]);
  });

  it('names each series with its unit in the chosen system and gives each its own look', () => {
    const si = prepareSweep(sweep, 'SI');
    const us = prepareSweep(sweep, 'US');
    expect(si.xLabel).toBe('Boom length (mm)');
    expect(us.xLabel).toBe('Boom length (in)');
    expect(si.series.map((s) => s.name)).toEqual(['Tie tension (N)', 'Tie angle (°)']);
    expect(us.series.map((s) => s.name)).toEqual(['Tie tension (lbf)', 'Tie angle (°)']);
    expect(us.yLabel).toBe('lbf, °');
    expect(new Set(si.series.map((s) => `${s.look.stroke} ${s.look.dash}`)).size).toBe(2);
  });
});

describe('tornado rows for the charts', () => {
  const tornado: TornadoOutput = {
    result: { key: 'T', label: 'Tie tension', quantity: 'force' },
    base: 1000,
    percent: 10,
    bars: [
      { input: 'L', label: 'Boom length', quantity: 'length', low: { input: 900, value: 1200 }, high: { input: 1100, value: 850 }, swing: 350, elasticity: -1.75 },
      { input: 'h', label: 'Tie height', quantity: 'length', low: { input: 90, value: null, note: 'cannot close' }, high: { input: 110, value: 1100 }, swing: 100, elasticity: null },
    ],
  };

  it('spans each bar from the smaller to the larger moved result, a failed side on the base', () => {
    const t = prepareTornado(tornado, 'SI');
    expect(t.rows.map((r) => r.range)).toEqual([
      [850, 1200],
      [1000, 1100],
    ]);
    expect(t.rows.map((r) => r.halfSwing)).toEqual([175, 50]);
    expect(t.axisLabel).toBe('Tie tension (N)');
  });

  it('shows the bars in the display system', () => {
    const t = prepareTornado(tornado, 'US');
    expect(t.base).toBeCloseTo(1000 / N_PER_LBF, 9);
    expect(t.rows[0]!.range[0]).toBeCloseTo(850 / N_PER_LBF, 9);
    expect(t.rows[0]!.halfSwing).toBeCloseTo(175 / N_PER_LBF, 9);
    expect(t.axisLabel).toBe('Tie tension (lbf)');
  });
});
