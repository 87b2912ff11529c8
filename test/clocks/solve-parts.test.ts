import { describe, expect, it } from 'vitest';
import { seconds } from '../../src/units/quantities.js';
import { solvePlan } from '../../src/plan/solve-plan.js';
import { planRates } from '../../src/solve/feasible-set.js';
import { planPart } from '../../src/clocks/plan-part.js';
import { driftHeadroom } from '../../src/solve/drift.js';
import { planReport } from '../../src/plan/plan-report.js';
import { planTable } from '../../src/output/plan-table.js';
import { part, synthesiser } from './part-fixtures.js';
import { handWorkedContext, MHZ } from '../helpers/hand-worked-plan.js';

describe('solvePlan puts every clock part forward at its best rate', () => {
  // The plan worked on paper in test/solve/hand-worked.test.ts, with four invented Heron parts.
  const xo = part('XO-26 26M', 26 * MHZ, { kind: 'direct' }, 0, 1e-12);
  const divided = part('XO-D 120M', 120 * MHZ, { kind: 'divider' }, 0, 0.5e-12);
  const syn = part('SYN-H 10M', 10 * MHZ, synthesiser([1, 20], [3, 3], [1, 2], [1 * MHZ, 55 * MHZ]), 0);
  const outside = part('XO-Z 75M', 75 * MHZ, { kind: 'direct' });
  const context = handWorkedContext({
    clocks: [xo, divided, syn, outside],
    clocking: { clockDividers: [1, 2, 3], bits: 12, apertureJitter: seconds(0.2e-12) },
  });
  const set = planRates(context);
  const result = solvePlan(context);

  it('one candidate per part with a rate in range, as planPart plans it; the part outside the range listed as unplanned', () => {
    const clocks = result.candidates.filter((c) => c.origin === 'clock');
    expect(clocks.map((c) => c.label).sort()).toEqual(['SYN-H 10M', 'XO-26 26M', 'XO-D 120M']);
    for (const c of clocks) {
      const plan = planPart(
        context,
        set,
        context.clocks.find((p) => p.label === c.label)!,
      )!;
      // The first-ranked candidate is judged again on every interferer: the same rate, verdict and margins.
      const { checks: _c, checkScope: _s, ...judged } = c.evaluation;
      const { checks: _p, checkScope: _t, ...planned } = plan.evaluation;
      expect(judged).toEqual(planned);
      expect(c.evaluation.checkScope).toBe(c === result.candidates[0] ? 'all' : 'blocking');
      expect(c.partSearch).toEqual({ method: plan.search, ratesJudged: plan.ratesJudged });
      expect(c.settings).toEqual(plan.settings);
      expect(c.headroom).toEqual(plan.headroom);
      expect(c.snr).toEqual(plan.snr);
    }
    expect(result.parts.map((p) => p.part.label)).toEqual(['XO-26 26M', 'XO-D 120M', 'SYN-H 10M']);
    expect(result.unplannedParts).toEqual(['XO-Z 75M']);
    expect(clocks.find((c) => c.label === 'XO-D 120M')!.settings).toEqual({ N: 1, M: 1, D: 2 });
    expect(clocks.find((c) => c.label === 'SYN-H 10M')!.settings).toEqual({ N: 16, M: 3, D: 1 });
  });

  it('interval candidates carry no settings or SNR, and the headroom of their rate', () => {
    const intervals = result.candidates.filter((c) => c.origin === 'interval');
    expect(intervals.length).toBe(4);
    for (const c of intervals) {
      expect(c.settings).toBeNull();
      expect(c.snr).toBeNull();
      expect(c.headroom).toEqual(driftHeadroom(set, context.limits, c.evaluation.rate));
    }
  });

  it('reports settings, headroom (with its limits), jitter and channel SNR per candidate, and the unplanned parts', () => {
    const report = JSON.parse(JSON.stringify(planReport('hand-worked', context, result)));
    const byLabel = (label: string) => report.candidates.find((c: { label: string }) => c.label === label);
    const plannedXo = result.parts[0]!;
    expect(byLabel('XO-26 26M')).toMatchObject({
      rate: 26 * MHZ,
      settings: { N: 1, M: 1, D: 1 },
      headroomPpm: { down: plannedXo.headroom!.downPpm, up: plannedXo.headroom!.upPpm },
      headroomLimitedBy: { down: 'zone edge', up: 'rate/4 spur' },
      jitterSnrDb: plannedXo.snr.jitterSnrDb,
      channelSnrDb: plannedXo.snr.channelSnrDb,
    });
    // 1 ps and 0.2 ps in quadrature at the 25 MHz band top: −20·log10(2π·25e6·√(1.04)·1e-12) (IEEE Std 1241-2010 formula).
    expect(byLabel('XO-26 26M').jitterSnrDb).toBeCloseTo(-20 * Math.log10(2 * Math.PI * 25e6 * Math.sqrt(1.04) * 1e-12), 10);
    expect(byLabel('SYN-H 10M').jitterSnrDb).toBeNull(); // the part states no jitter
    const interval = report.candidates.find((c: { origin: string }) => c.origin === 'interval');
    expect(interval.label).toMatch(/^best in \d/);
    expect(interval).toMatchObject({ settings: null, jitterSnrDb: null, channelSnrDb: null });
    expect(report.unplannedParts).toEqual(['XO-Z 75M']);
  });

  it('shows the settings and headroom in the candidates table, and names the unplanned part', () => {
    const table = planTable(planReport('hand-worked', context, result), Infinity);
    expect(table).toMatch(/settings\s+drift room/);
    expect(table).toContain('×16/3');
    expect(table).toContain('÷2');
    expect(table).toContain('direct');
    expect(table).toMatch(/Not planned \(no rate inside the converter's range\): XO-Z 75M\./);
  });
});
