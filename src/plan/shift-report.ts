import { hz, type Hz, type Ppm } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import { nextLimit } from '../solve/next-limit.js';
import type { ShiftedRate, ShiftSearch } from '../solve/if-shift/best-shift-and-rate.js';
import { limitText, type LimitKind } from '../solve/limited-by.js';

/** One (IF shift, rate) pair as reported. */
export interface ReportedShift {
  /** δ, Hz. */
  readonly shift: Hz;
  readonly rate: Hz;
  readonly tolerancePpm: Ppm;
  /** The new IF centre: the nominal centre plus δ, Hz. */
  readonly center: Hz;
  readonly zone: number | null;
  readonly inverted: boolean | null;
  /** Aliased centre of the moved band, where the NCO is tuned, Hz. */
  readonly nco: Hz | null;
  readonly worstMargin: Hz;
  readonly limitedBy: string;
  /** 'interferer' or 'zone edge': what limitedBy names. */
  readonly limitedByKind: LimitKind;
  readonly worstSlack: Hz;
  /** The tightest check with more slack than the worst (what decides between pairs that tie on the worst); null when none. */
  readonly next: { readonly limitedBy: string; readonly limitedByKind: LimitKind; readonly margin: Hz; readonly slack: Hz } | null;
  /** "piece": a two-variable LP optimum; "sample": the fixed-shift solver's best at a seed shift. */
  readonly origin: ShiftedRate['origin'];
  readonly pass: boolean;
}

/** The `ifShift` section of the solve report. */
export interface ShiftReport {
  readonly low: Hz;
  readonly high: Hz;
  readonly best: ReportedShift | null;
  /** The best pair at the nominal IF, for comparison; null when 0 is outside the range or nothing is feasible there. */
  readonly atNoShift: ReportedShift | null;
  readonly seedShifts: readonly Hz[];
  readonly piecesSolved: number;
}

/**
 * The report of the IF-shift search.
 *
 * @param band the nominal wanted band, Hz
 * @param search what bestShiftAndRate found
 * @returns the JSON section `ifShift`
 * @example shiftReport(heronNarrow.wanted, bestShiftAndRate(heronNarrow)).best.shift // 1e6
 */
export function shiftReport(band: Band, search: ShiftSearch): ShiftReport {
  const reported = (pair: ShiftedRate | null) => (pair ? reportedShift(band, pair) : null);
  return {
    low: search.range.low,
    high: search.range.high,
    best: reported(search.best),
    atNoShift: reported(search.atNoShift),
    seedShifts: search.seedShifts,
    piecesSolved: search.piecesSolved,
  };
}

function reportedShift(band: Band, pair: ShiftedRate): ReportedShift {
  const e = pair.evaluation;
  return {
    shift: pair.shift,
    rate: pair.rate,
    tolerancePpm: e.tolerancePpm,
    center: hz((band.low + band.high) / 2 + pair.shift),
    zone: e.zone,
    inverted: e.inverted,
    nco: e.center,
    worstMargin: e.worstMargin,
    limitedBy: limitText(e.limitedBy),
    limitedByKind: e.limitedBy.kind,
    worstSlack: e.worstSlack,
    next: nextLimit(e, band.high - band.low),
    origin: pair.origin,
    pass: e.pass,
  };
}
