/**
 * An independent brute-force judge of several channels sampled together with
 * fixed signals around them, written for the tests from the definition of
 * aliasing (common practice, no source): a real frequency f sampled at rate r
 * shows at |f − r·round(f/r)|. It imports nothing from src/ and reads the
 * scenario's numbers as written, not the interferer list the code derives: at
 * one rate it folds each channel, each other channel and each signal point by
 * point (brute-force-plan.ts, brute-force-bands.ts) and measures the gaps.
 *
 * The rules it applies, restated from the scenario format (README): each
 * channel's guarded band (a guard below DC stops at DC) must sit whole in one
 * zone; every other channel must alias at least this channel's spacing away
 * from it, whatever its level; a signal stronger than this channel's weakest
 * level minus its rejection must alias at least this channel's margin away.
 */
import { bruteLeastDistance, wholeInOneZone } from './brute-force-plan.js';
import { bruteBandAlias, signedGap, type BruteBand } from './brute-force-bands.js';

/** One channel as the scenario states it, Hz and dBFS. */
export interface BruteChannel extends BruteBand {
  readonly guardBelow: number;
  readonly guardAbove: number;
  /** Least gap to another channel's alias, Hz. */
  readonly spacing: number;
  /** Least gap to a blocking signal's alias, Hz (> 0). */
  readonly margin: number;
  /** Weakest level minus rejection, dBFS: a signal at or under it may land anywhere. */
  readonly threshold: number;
}

/** A fixed signal at the converter input (a neighbour band or a tone), Hz and dBFS. */
export interface BruteSignal extends BruteBand {
  readonly level: number;
}

/**
 * The verdict at one rate for all channels together.
 *
 * @param channels the channels
 * @param signals the fixed signals
 * @param rate sampling rate, Hz
 * @returns whether every channel is whole, apart from the others and clear of every signal that blocks it
 */
export function bruteChannelsPass(channels: readonly BruteChannel[], signals: readonly BruteSignal[], rate: number): boolean {
  const aliases: BruteBand[] = [];
  for (const c of channels) {
    if (!wholeInOneZone(Math.max(0, c.low - c.guardBelow), c.high + c.guardAbove, rate)) return false;
    const alias = bruteBandAlias(c, rate);
    if (alias === null) return false;
    aliases.push(alias);
  }
  for (const [i, c] of channels.entries()) {
    for (const [k, other] of aliases.entries()) if (k !== i && signedGap(aliases[i]!, other) < c.spacing) return false;
    for (const s of signals) {
      if (!(s.level > c.threshold)) continue;
      const extent = { rateMultiple: 0, low: s.low, high: s.high, requiredMargin: c.margin, blocking: true };
      if (bruteLeastDistance(extent, aliases[i]!, rate, c.margin) < c.margin) return false;
    }
  }
  return true;
}
