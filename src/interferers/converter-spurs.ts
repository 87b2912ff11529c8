import type { Db, Hz } from '../units/quantities.js';
import type { Scenario } from '../scenario/scenario.js';
import type { InterfererDraft } from './interferer-draft.js';
import { dbText } from './words.js';

const ZERO = 0 as Hz;

/**
 * A rate-tied spur's label: `DC`, `rate/3`, `3·rate/8`.
 *
 * @param numerator p ≥ 0
 * @param denominator q ≥ 1
 * @example rateFractionLabel(3, 8) // '3·rate/8'
 */
export function rateFractionLabel(numerator: number, denominator: number): string {
  if (numerator === 0) return 'DC';
  if (denominator === 1) return numerator === 1 ? 'rate' : `${numerator}·rate`;
  return numerator === 1 ? `rate/${denominator}` : `${numerator}·rate/${denominator}`;
}

/**
 * The converter's spurs tied to its sample rate r (kind `converter`), each a
 * tone at p/q·r (rateMultiple p/q, extent [0, 0]): DC, r/2 and r/4 where
 * their levels are stated, then each listed fraction p/q, then with M-way
 * interleaving the offset spurs at k·r/M (k = 1..M−1). The interleaving
 * images are interleaveImages'.
 *
 * @param scenario the validated scenario
 * @returns drafts labelled `DC`, `rate/2`, `rate/4`, `rate/3`, `3·rate/8`, `IL offset k/M`
 * @example converterSpurDrafts(heronBase).map((d) => d.label) // ['DC', 'rate/2', 'rate/4']
 */
export function converterSpurDrafts(scenario: Scenario): InterfererDraft[] {
  const { converter } = scenario;
  const drafts: InterfererDraft[] = [];
  const tone = (label: string, rateMultiple: number, spurLevel: Db, source: string): InterfererDraft => ({
    label,
    kind: 'converter',
    order: null,
    source: `${source}, ${dbText(spurLevel, 'dBFS')}`,
    rateMultiple,
    shiftMultiple: 0, // tied to the clock, not to the LO
    low: ZERO,
    high: ZERO,
    level: spurLevel,
  });
  const { dc, halfRate, quarterRate, fractions } = converter.rateSpurs;
  if (dc !== null) drafts.push(tone('DC', 0, dc, 'converter spur at DC'));
  if (halfRate !== null) drafts.push(tone('rate/2', 0.5, halfRate, 'converter spur at half the sample rate'));
  if (quarterRate !== null) drafts.push(tone('rate/4', 0.25, quarterRate, 'converter spur at a quarter of the sample rate'));
  for (const spur of fractions ?? []) {
    const where = `${spur.numerator}/${spur.denominator}`;
    drafts.push(
      tone(
        rateFractionLabel(spur.numerator, spur.denominator),
        spur.numerator / spur.denominator,
        spur.level,
        `converter spur at ${where} of the sample rate`,
      ),
    );
  }
  const interleave = converter.interleave;
  if (interleave === null) return drafts;
  const m = interleave.ways;
  for (let k = 1; k < m; k++) {
    drafts.push(
      tone(`IL offset ${k}/${m}`, k / m, interleave.offsetSpur, `interleaving offset spur at ${k}/${m} of the sample rate (${m} cores)`),
    );
  }
  return drafts;
}
