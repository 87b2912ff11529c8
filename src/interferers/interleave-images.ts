import { db, type Db, type Hz } from '../units/quantities.js';
import type { Interleave, Scenario } from '../scenario/scenario.js';
import type { InterfererDraft } from './interferer-draft.js';
import { isBlocking } from './level-threshold.js';
import { dbText } from './words.js';

/**
 * The level of an interleaving image relative to its source, dBc, for a
 * source reaching up to `frequency`: the stated imageLevel, flat in
 * frequency (gain mismatch between the cores), or with imageReference
 * f0 given, imageLevel + 20·log10(f/f0): a timing skew τ between cores
 * samples a tone A·cos(2πft) with an error of about 2πfτ·A, so its images
 * rise 20 dB per decade of input frequency (common practice, no source).
 * A band takes its highest frequency, the worst case.
 *
 * @param interleave the converter's interleaving
 * @param frequency the source's highest input frequency, Hz (magnitude)
 * @returns dBc
 * @example imageDbc({ ways: 4, offsetSpur: db(-80), imageLevel: db(-60), imageReference: hz(100e6) }, hz(200e6)) // −53.98
 */
export function imageDbc(interleave: Interleave, frequency: number): Db {
  if (interleave.imageReference === null || interleave.imageReference === undefined) return interleave.imageLevel;
  return db(interleave.imageLevel + 20 * Math.log10(Math.max(frequency, Number.MIN_VALUE) / interleave.imageReference));
}

/** What was left out: images at or below the threshold. */
export interface ImageList {
  readonly drafts: readonly InterfererDraft[];
  readonly pruned: number;
}

/**
 * The interleaving images of every signal at the converter input and of
 * every product strong enough to block (`sources`: fixed extents,
 * rateMultiple 0), at k/M·r − [l, h] (rateMultiple k/M, extent [−h, −l],
 * IF-shift multiple −b) and k/M·r + [l, h] for k = 1..M−1, each at the
 * source's level plus imageDbc. Images at or below the threshold are left
 * out and counted; the wanted band's images are always listed.
 *
 * @param sources the drafts of the input signals and products (their `mixing` is kept, the image placed beside it)
 * @param scenario the validated scenario (interleave, threshold)
 * @param listing the same sources as they decide which images are listed (default: `sources`; see mixingProducts)
 * @param ownChannel the channel planned (its index among the scenario's channels, default 0): its images are always listed and named as the wanted band's
 * @returns drafts labelled `IL image k/M−` / `IL image k/M+` for the wanted band, `IL image k/M− <source>` otherwise
 * @example interleaveImages([], s).drafts.length // 0
 */
export function interleaveImages(
  sources: readonly InterfererDraft[],
  scenario: Scenario,
  listing: readonly InterfererDraft[] = sources,
  ownChannel = 0,
): ImageList {
  const interleave = scenario.converter.interleave;
  if (interleave === null) return { drafts: [], pruned: 0 };
  const m = interleave.ways;
  const drafts: InterfererDraft[] = [];
  let pruned = 0;
  for (const [index, source] of sources.entries()) {
    if (source.rateMultiple !== 0) continue;
    const decides = listing[index]!;
    const term = source.mixing?.length === 1 ? source.mixing[0]! : null;
    const isWanted = term !== null && term.signal === 'wanted' && term.index === ownChannel && term.plus === 1 && term.minus === 0;
    const dbc = imageDbc(interleave, Math.max(Math.abs(source.low), Math.abs(source.high)));
    const level = db(source.level + dbc);
    const listed = db(decides.level + imageDbc(interleave, Math.max(Math.abs(decides.low), Math.abs(decides.high))));
    if (!isWanted && !isBlocking(listed, scenario)) {
      pruned += 2 * (m - 1);
      continue;
    }
    const what = isWanted ? 'the wanted band' : source.label;
    const slope =
      interleave.imageReference === null || interleave.imageReference === undefined
        ? ''
        : `, rising 20 dB per decade from ${dbText(interleave.imageLevel, 'dBc')} at the reference frequency`;
    for (let k = 1; k < m; k++) {
      for (const side of [-1, 1] as const) {
        const sign = side === -1 ? '−' : '+';
        drafts.push({
          label: isWanted ? `IL image ${k}/${m}${sign}` : `IL image ${k}/${m}${sign} ${source.label}`,
          kind: 'converter',
          order: null,
          source: `interleaving image of ${what} at ${k}/${m} of the sample rate ${sign} f (${dbText(dbc, 'dBc')}${slope})`,
          rateMultiple: k / m,
          shiftMultiple: side * source.shiftMultiple, // k/M·r ∓ (extent + b·δ)
          low: (side === -1 ? -source.high : source.low) as Hz,
          high: (side === -1 ? -source.low : source.high) as Hz,
          level,
          ...(source.mixing ? { mixing: source.mixing } : {}),
          image: { k, ways: m, side },
        });
      }
    }
  }
  return { drafts, pruned };
}
