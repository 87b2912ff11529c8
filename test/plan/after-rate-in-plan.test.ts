import { describe, expect, it } from 'vitest';
import { db, hz } from '../../src/units/quantities.js';
import { solveScenario } from '../../src/plan/plan-scenario.js';
import { planTable } from '../../src/output/plan-table.js';
import { afterRateInputs, channelSnrWithDriver } from '../../src/after-rate/after-rate.js';
import { scenarioFixture } from '../helpers/scenario-fixture.js';
import { candidateVerdict } from '../../src/output/after-rate-words.js';
import { limitText } from '../../src/solve/limited-by.js';

/**
 * The after-rate figures inside the solved plan, on a scenario of our own (the invented Heron test fixture:
 * 65–75 MHz, 2 MHz guards, 1 MHz margin, threshold −60 − 40 = −100 dBFS, 500 MHz input bandwidth).
 */
const withSettings = (
  settings: Partial<ReturnType<typeof scenarioFixture>['afterRate']>,
  filter: ReturnType<typeof scenarioFixture>['filter'] = null,
) => {
  const base = scenarioFixture({ filter });
  return { ...base, afterRate: { ...base.afterRate, ...settings } };
};

function solved(scenario: ReturnType<typeof scenarioFixture>) {
  const { result, report } = solveScenario(scenario);
  return { result, report };
}

describe('after-rate figures in the plan report', () => {
  it("without a stated level the mask is reported only: every verdict and the best are the solver's", () => {
    const { result, report } = solved(withSettings({}));
    expect(report.best).toBe(result.candidates.find((c) => c.evaluation.pass)?.label ?? null);
    for (const c of report.candidates) {
      expect(c.pass).toBe(result.candidates.find((r) => r.label === c.label)!.evaluation.pass);
      expect(c.afterRate?.mask.levelStated).toBe(false);
      // No filter at all: 0 dB given everywhere against 0 − (−100) = 100 dB needed.
      expect(c.afterRate?.mask.worst?.marginDb).toBe(-100);
    }
  });

  it('a stated level the filter cannot hold back fails every candidate, and the verdict names the anti-alias mask', () => {
    const { report } = solved(withSettings({ outOfBandLevel: db(-20) }));
    expect(report.best).toBeNull();
    expect(report.candidates.every((c) => !c.pass)).toBe(true);
    // The verdict is prose wrapped to the width: read it as one line.
    expect(planTable(report, 100).replace(/\s+/g, ' ')).toMatch(
      /No candidate passes\. Nearest: .*anti-alias mask: the filter gives 0\.0 dB at .* where 80\.0 dB is needed \(short by 80\.0 dB\)/,
    );
  });

  it('a candidate every frequency check passes but the mask fails is limited by the anti-alias mask; the others keep their check', () => {
    // −20 dBFS out of band against the −100 dBFS threshold: 80 dB needed, 0 dB given with no filter (worked by hand).
    const { result, report } = solved(withSettings({ outOfBandLevel: db(-20) }));
    let maskLimited = 0;
    for (const c of report.candidates) {
      const solver = result.candidates.find((r) => r.label === c.label)!.evaluation;
      expect(c.afterRate!.mask.worst!.marginDb).toBe(-80);
      if (solver.pass) {
        maskLimited++;
        expect([c.limitedBy, c.limitedByKind]).toEqual(['anti-alias mask', 'anti-alias mask']);
        expect([c.channels[0]!.limitedBy, c.channels[0]!.limitedByKind]).toEqual(['anti-alias mask', 'anti-alias mask']);
        expect(candidateVerdict(c)).toBe('FAIL: mask');
      } else {
        expect([c.limitedBy, c.limitedByKind]).toEqual([limitText(solver.limitedBy), solver.limitedBy.kind]);
        expect(candidateVerdict(c)).toBe('FAIL, mask too');
      }
    }
    // Without the stated level the same candidates pass, limited by a frequency check.
    expect(maskLimited).toBeGreaterThan(0);
    const reportedOnly = solved(withSettings({})).report;
    for (const c of reportedOnly.candidates) expect(c.limitedByKind).not.toBe('anti-alias mask');
  });

  it("a filter that holds the stated level keeps the solver's best; each candidate carries orders, noise and NCO settings", () => {
    // A 7th-order Butterworth band-pass 63–77 MHz.
    const filter = { kind: 'butterworth', order: 7, passLow: hz(63e6), passHigh: hz(77e6) } as const;
    const { result, report } = solved(
      withSettings(
        {
          outOfBandLevel: db(-60),
          driverNoiseDensity: db(-150),
          downConverter: { ncoBits: 24, outputRate: hz(15.36e6), usableFraction: 0.8 },
        },
        filter,
      ),
    );
    const passing = report.candidates.filter((c) => c.pass);
    for (const c of passing) expect(c.afterRate!.mask.worst!.marginDb).toBeGreaterThanOrEqual(0);
    for (const c of report.candidates.filter((r) => !r.pass)) {
      const solverPass = result.candidates.find((r) => r.label === c.label)!.evaluation.pass;
      expect(solverPass && c.afterRate!.mask.pass).toBe(false);
    }
    const best = report.candidates.find((c) => c.label === report.best);
    expect(best).toBeDefined();
    const after = best!.afterRate!;
    expect(after.mask.requiredDb).toBe(40);
    expect(after.design.orders).not.toBeNull();
    expect(after.noise!.penaltyDb).toBeGreaterThanOrEqual(0);
    expect(after.downConverter.nco?.bits).toBe(24);
    expect(after.downConverter.nco?.target).toBe(best!.nco);
    expect(after.downConverter.decimation?.outputRate).toBe(15.36e6);
    expect(planTable(report, 100)).toContain(`After the rate, at ${best!.label}`);
  });

  it('no filter and an input bandwidth of 8 whole zones at 122.88 MHz: every candidate at that rate folds in 10·log10(8) dB (common practice)', () => {
    // 8 · 61.44 MHz = 491.52 MHz; the channel 65–75 MHz sits whole in zone 2, so each of the 8 zones holds one whole image.
    const base = withSettings({});
    const scenario = { ...base, converter: { ...base.converter, inputBandwidth: hz(491.52e6) } };
    const { report } = solved(scenario);
    const at = report.candidates.filter((c) => c.rate === 122.88e6);
    expect(at.length).toBeGreaterThan(0);
    for (const c of at) expect(c.afterRate!.noise!.penaltyDb).toBeCloseTo(10 * Math.log10(8), 9);
  });

  it('the driver lowers the channel SNR as noise powers add: 80 dB and 80 dB make 76.99 dB', () => {
    const noise = {
      channelBandwidth: hz(1),
      aliasBandwidth: hz(0),
      penaltyDb: db(0),
      accuracyDb: db(0),
      driverNoiseDensity: db(-80),
      driverSnrDb: db(80),
    };
    expect(channelSnrWithDriver(db(80), noise)).toBeCloseTo(80 - 10 * Math.log10(2), 9);
    expect(channelSnrWithDriver(null, noise)).toBeNull();
    expect(channelSnrWithDriver(db(80), { ...noise, driverNoiseDensity: null, driverSnrDb: null })).toBeNull();
  });

  it("the down-converter's output rate falls back on the decimation goal", () => {
    const scenario = scenarioFixture({ goal: { kind: 'decimation', outputRate: hz(30.72e6) } });
    expect(afterRateInputs(scenario).outputRate).toBe(30.72e6);
    expect(afterRateInputs(scenario, { kind: 'widest-margin' }).outputRate).toBeNull();
  });
});
