import type { Db, Hz } from '../units/quantities.js';
import type { InterfererKind } from '../interferers/interferer.js';
import type { LimitKind } from '../solve/limited-by.js';

/**
 * The result of `ifzone verify`: a simulated capture set beside the plan at
 * one rate. The table, the JSON and any picture read this one structure;
 * frequencies in Hz, levels in dBFS, positions also in FFT bins.
 */
export interface VerifyResult {
  readonly scenario: string;
  readonly rate: Hz;
  readonly samples: number;
  /** R/N, Hz. */
  readonly binWidth: Hz;
  readonly window: { readonly name: string; readonly coherentGain: number; readonly noiseBandwidthBins: number };
  readonly wantedTones: number;
  readonly converter: {
    readonly bits: number;
    /** a[0..K] of y = x + Σ a_k·x^k. */
    readonly coefficients: readonly number[];
    readonly dither: string;
    readonly clippedSamples: number;
  };
  readonly levels: {
    /** weakestLevel − rejection, dBFS: spurs above it must stay clear of the band. */
    readonly threshold: Db;
    /** Median bin level, dBFS. */
    readonly noiseMedian: Db;
    /** Peaks count above this, dBFS. */
    readonly floor: Db;
    /** Level tolerance, dB. */
    readonly tolerance: Db;
  };
  readonly margin: Hz;
  /** The wanted band after sampling, [low, high] segments, Hz. */
  readonly wantedImage: ReadonlyArray<readonly [Hz, Hz]>;
  readonly tones: readonly ToneRow[];
  /** Lines looked for: the model puts them at least 3 dB above the floor. */
  readonly predictions: readonly PredictionRow[];
  /** Per check, the lines the model puts under that: not looked for. */
  readonly underFloor: readonly UnderFloor[];
  /** Measured peaks that no line of the plan accounts for. */
  readonly unlisted: readonly PeakRow[];
  /** Peaks above the threshold inside the margin of the wanted image (with several channels, of any channel's image, each under its channel). */
  readonly intrusions: readonly PeakRow[];
  /** The wanted band (one entry, labelled "wanted"), or each of several channels: the plan there and what the capture shows of it. */
  readonly channels: readonly VerifiedChannel[];
  /** The plan's own verdict at the nominal rate, no drift. */
  readonly plan: { readonly pass: boolean; readonly limitedBy: string; readonly limitedByKind: LimitKind; readonly worstMargin: Hz };
  /** Interferers of the plan that nothing in the capture stands for. */
  readonly notSimulated: readonly string[];
  /** Whether the model's list of products ran to its end (see enumerateProducts); false: unexplained peaks may be unnamed products. */
  readonly modelComplete: boolean;
  /** Each reason the capture contradicts the plan, in words; empty when it does not. */
  readonly contradictions: readonly string[];
  readonly consistent: boolean;
  /** What was compared with what, in words. */
  readonly compared: string;
  readonly caution: string;
}

/**
 * One channel in a capture: the plan's zone, inversion, image and verdict
 * for it, and what the capture shows. With several channels the capture
 * places tones across each channel's band; their measured places must lie
 * in the plan's image of that channel, in the order its inversion says, and
 * no peak above the channel's threshold may land in its image or within the
 * margin of it (another channel's tones included).
 */
export interface VerifiedChannel {
  readonly label: string;
  readonly zone: number | null;
  readonly inverted: boolean | null;
  /** The channel after sampling, [low, high] segments, Hz. */
  readonly image: ReadonlyArray<readonly [Hz, Hz]>;
  /** This channel's weakest level less its rejection, dBFS. */
  readonly threshold: Db;
  /** The plan's verdict for this channel at the nominal rate, no drift. */
  readonly planPass: boolean;
  /** How many of the channel's tones show as peaks (±1 bin of their fold); null for a single wanted band (not judged this way). */
  readonly tonesSeen: number | null;
  /** The order of those peaks against the tones' order at the input: upright (rising), inverted (falling), folded (neither), one tone (no order to see) or unseen; null for a single wanted band. */
  readonly order: 'upright' | 'inverted' | 'folded' | 'one tone' | 'unseen' | null;
  /** Peaks above this channel's threshold inside its image or within their margin of it. */
  readonly intrusions: readonly PeakRow[];
  /** Each reason the capture contradicts the plan for this channel, in words; empty when it agrees. */
  readonly contradictions: readonly string[];
  readonly consistent: boolean;
}

/** Lines of one check that the model puts under the floor. */
export interface UnderFloor {
  readonly check: string;
  readonly lines: number;
  /** The strongest of them by the model, dBFS; null when only counted (a check with very many lines). */
  readonly strongest: Db | null;
}

/** One synthesised tone. */
export interface ToneRow {
  readonly label: string;
  readonly role: 'wanted' | 'neighbour' | 'board spur' | 'converter';
  readonly nominal: Hz;
  readonly frequency: Hz;
  /** frequency − nominal, Hz. */
  readonly move: Hz;
  /** Where it shows, 0..N/2. */
  readonly bin: number;
  readonly level: Db;
}

/**
 * How a line's plan level is judged: `plan` — the plan's level is the level
 * the capture synthesised or fitted, so the measurement must match it within
 * the tolerance; `bound` — the plan's level is a band's worst case or an
 * extrapolation, so the measurement must not exceed it by more than the
 * tolerance when above the threshold.
 */
export type LevelBasis = 'plan' | 'bound';

export type LineStatus =
  'agrees' | 'found' | 'below floor' | 'crowded' | 'missing' | 'off position' | 'outside plan segments' | 'off level' | 'above plan level';

/** Statuses that contradict the plan. */
export const CONTRADICTING: ReadonlySet<LineStatus> = new Set([
  'missing',
  'off position',
  'outside plan segments',
  'off level',
  'above plan level',
]);

/** One line predicted for one of the plan's interferers, beside its measurement. */
export interface PredictionRow {
  /** The interferer's label in the plan. */
  readonly check: string;
  readonly kind: InterfererKind;
  /** The tone or product, e.g. `3·W1`, `2·W1 − ADJ`. */
  readonly line: string;
  /** `tone`: a zero-width source, predicted by the plan at one point; `band`: a product of the tones standing for a band. */
  readonly width: 'tone' | 'band';
  readonly basis: LevelBasis;
  /** Tone: the plan's alias; band: where the product folds, by whole-cycle arithmetic. */
  readonly predicted: { readonly frequency: Hz; readonly bin: number };
  /** Band: whether that place lies in the plan's aliased segments (±1 bin); tone: null. */
  readonly insidePlan: boolean | null;
  readonly planLevel: Db;
  /** The capture model's own level for the line (multinomial expansion of the polynomial), dBFS. */
  readonly modelLevel: Db;
  readonly measured: { readonly frequency: Hz; readonly bin: number; readonly level: Db } | null;
  /** measured − predicted bin. */
  readonly binError: number | null;
  /** measured − plan level, dB. */
  readonly levelError: Db | null;
  readonly status: LineStatus;
  readonly note: string;
}

/** A measured peak. */
export interface PeakRow {
  readonly frequency: Hz;
  readonly bin: number;
  readonly level: Db;
  /** What the capture's model says it is (a product not in the plan, a line of the plan, window overlap), or null: unexplained. */
  readonly explainedBy: string | null;
  /** Distance to the wanted image, Hz (0 inside). */
  readonly distance: Hz;
}
