import type { Db, Hz } from '../units/quantities.js';
import type { Scenario } from '../scenario/scenario.js';
import type { Interferer } from './interferer.js';
import { isBlocking } from './level-threshold.js';

/**
 * An interferer before the scenario-wide fields (margin, blocking) are
 * filled in; `ownMargin` carries a margin its signal states for itself.
 */
export type InterfererDraft = Omit<Interferer, 'requiredMargin' | 'blocking'> & { readonly ownMargin?: Hz | null };

/**
 * The margin an interferer must keep, Hz: its signal's own where stated,
 * else its kind's (requirements.kindMargins), else the scenario's. The one
 * expression of a required margin: the solver's interferers and the
 * anti-alias mask's alias bands (src/after-rate/) both take it from here.
 *
 * @param draft the draft (kind, ownMargin)
 * @param scenario the validated scenario
 * @returns Hz
 * @example requiredMarginOf({ kind: 'neighbour', ownMargin: hz(0) }, s) // 0 (its own margin wins over the scenario's)
 */
export function requiredMarginOf(draft: Pick<InterfererDraft, 'kind' | 'ownMargin'>, scenario: Scenario): Hz {
  const kindMargin = draft.kind === 'channel' ? undefined : scenario.requirements.kindMargins?.[draft.kind];
  return draft.ownMargin ?? kindMargin ?? scenario.requirements.margin;
}

/**
 * Completes a draft with its required margin (requiredMarginOf) and its
 * blocking flag. Another channel always blocks: channels' aliases must stay
 * apart whatever their levels, as each must sit whole in a zone.
 *
 * @param draft label, kind, order, source, extent (Hz) and level (dBFS)
 * @param scenario the validated scenario
 * @returns the interferer
 * @example complete({ label: 'DC', kind: 'converter', order: null, source: '…', rateMultiple: 0, shiftMultiple: 0, low: hz(0), high: hz(0), level: db(-80) }, s) // { requiredMargin: 1e6, blocking: true }
 */
export function complete(draft: InterfererDraft, scenario: Scenario): Interferer {
  const { ownMargin: _own, ...rest } = draft;
  return {
    ...rest,
    requiredMargin: requiredMarginOf(draft, scenario),
    blocking: draft.kind === 'channel' || isBlocking(draft.level, scenario),
  };
}

/** A fixed extent k·[low, high] for k ≥ 0, Hz. */
export function scaled(k: number, band: { readonly low: Hz; readonly high: Hz }): { low: Hz; high: Hz } {
  return { low: (k * band.low) as Hz, high: (k * band.high) as Hz };
}

/** A level in dB from a plain sum. */
export const level = (value: number): Db => value as Db;
