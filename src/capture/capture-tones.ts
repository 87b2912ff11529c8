import { db, hz, type Db, type Hz } from '../units/quantities.js';
import type { Scenario } from '../scenario/scenario.js';
import { leastAttenuation } from '../filter/filter-attenuation.js';
import { cyclesFrequency, foldCycles, nearestCycles } from './coherent-bins.js';
import { rateFractionLabel } from '../interferers/converter-spurs.js';
import { seededUniform } from './seeded-random.js';

/** What a synthesised tone stands for. */
export type ToneSource =
  /** The index-th tone of a channel's band (channel 0: the wanted band, or the first of several channels). */
  | { readonly kind: 'wanted'; readonly index: number; readonly channel: number }
  | { readonly kind: 'neighbour'; readonly index: number }
  | { readonly kind: 'board spur'; readonly index: number; readonly harmonic: number }
  | { readonly kind: 'rate spur'; readonly numerator: number; readonly denominator: number }
  | { readonly kind: 'interleave offset'; readonly k: number };

/** One tone of the simulated capture. */
export interface CaptureTone {
  readonly label: string;
  readonly source: ToneSource;
  /** True for a signal at the converter's input (it passes through the polynomial); false for a spur added after quantisation. */
  readonly input: boolean;
  /** The frequency the scenario gives (a band's tone: where it was first put), Hz. */
  readonly nominal: Hz;
  /** Whole cycles in the record (may exceed N: the tone is undersampled). */
  readonly cycles: number;
  /** cycles·R/N, Hz. */
  readonly frequency: Hz;
  /** frequency − nominal, Hz. */
  readonly move: Hz;
  /** dBFS at the converter. */
  readonly level: Db;
  readonly amplitude: number;
  readonly phase: number;
}

/** Where the movable tones (inside bands) sit: whole-cycle offsets from their first place. */
export interface ToneLayout {
  /** Per wanted tone, channel by channel (the c-th channel's i-th tone at c·n + i for n tones per channel). */
  readonly wanted: readonly number[];
  readonly neighbours: readonly number[];
}

/** The record the capture is taken over. */
export interface CaptureRecord {
  readonly rate: Hz;
  readonly samples: number;
  /** Tones across the wanted band, or across each channel's band. */
  readonly wantedTones: number;
}

const PHASE_SEED = 0x1f2e3d;

/**
 * The nominal places of the wanted tones: n tones at the centres of n equal
 * slices of the band (one tone: the band centre).
 *
 * @example wantedNominals({ low: hz(60e6), high: hz(90e6) }, 3) // [65e6, 75e6, 85e6]
 */
export function wantedNominals(band: { readonly low: Hz; readonly high: Hz }, count: number): Hz[] {
  return Array.from({ length: count }, (_, i) => hz(band.low + ((band.high - band.low) * (2 * i + 1)) / (2 * count)));
}

/** A band the capture puts wanted tones across: its band, strongest level and the prefix of its tones' labels. */
export interface ToneBand {
  readonly low: Hz;
  readonly high: Hz;
  readonly strongestLevel: Db;
  /** `W` for the one wanted band (tones W1, W2, …); a channel's label and a dot for several channels (L1.1, L1.2, …). */
  readonly prefix: string;
}

/**
 * The bands the capture puts wanted tones across: the wanted band alone
 * (tones W1, W2, …), or each channel of several (tones labelled by the
 * channel: L1.1, L1.2, …, L5.1, …), in the scenario's order.
 *
 * @param scenario the validated scenario
 * @returns one band per channel
 * @example toneBands(s) // [{ low: 65e6, high: 75e6, prefix: 'W' }]
 */
export function toneBands(scenario: Scenario): ToneBand[] {
  if (scenario.channels.length <= 1) return [{ ...scenario.wanted, prefix: 'W' }];
  return scenario.channels.map((c) => ({ low: c.low, high: c.high, strongestLevel: c.strongestLevel, prefix: `${c.label}.` }));
}

/**
 * Each wanted tone's level: the strongest wanted level less 20·log10(n), so
 * that n tones in phase peak at the strongest level and the converter is not
 * overdriven (one tone: the strongest level itself). The per-tone back-off
 * is the usual one of multi-tone tests (common practice, no source).
 *
 * @param band the wanted band or a channel (its strongest level, dBFS)
 * @param count number of wanted tones ≥ 1
 * @returns dBFS per tone
 * @example wantedToneLevel(s.wanted, 3) // -10.54 (−1 dBFS less 20·log10(3))
 */
export function wantedToneLevel(band: { readonly strongestLevel: Db }, count: number): Db {
  return db(band.strongestLevel - 20 * Math.log10(count));
}

/**
 * The scenario with every tone source (a board spur or neighbour of zero
 * width) moved to the nearest whole number of cycles in the record, so that
 * the plan can be re-derived at the frequencies actually synthesised. Bands
 * are left as they are; their tones are placed inside them.
 *
 * @param scenario the validated scenario
 * @param record rate R (Hz) and length N
 * @returns a copy with moved tone sources
 * @example movedScenario(heronBase, { rate: hz(184.32e6), samples: 65536, wantedTones: 1 }).name // 'Heron-4 base'
 */
export function movedScenario(scenario: Scenario, record: CaptureRecord): Scenario {
  const moved = <T extends { readonly low: Hz; readonly high: Hz }>(item: T): T => {
    if (item.low !== item.high) return item;
    const f = cyclesFrequency(nearestCycles(item.low, record.rate, record.samples), record.rate, record.samples);
    return { ...item, low: f, high: f };
  };
  return { ...scenario, boardSpurs: scenario.boardSpurs.map(moved), neighbours: scenario.neighbours.map(moved) };
}

/**
 * Every tone of the capture, from the scenario as written (the moves are
 * made here, and reported as each tone's move):
 * - the wanted tones (wantedToneLevel), placed at whole cycles nearest their
 *   nominal places plus the layout's offsets; with several channels, n
 *   tones across each channel's band at that channel's level;
 * - each neighbour as a tone at its centre (plus its offset), at its level
 *   after the filter's least attenuation over the band (its strongest part,
 *   the level the plan uses);
 * - each board spur and its harmonics h = 2..harmonics as tones of h times
 *   the spur's cycles, at level − 20·log10(h) (the plan's roll-off), less the
 *   filter's attenuation when coupled before the filter;
 * - after the converter: DC, rate/2, rate/4 and each listed fraction p/q of
 *   the rate where stated (at round(p·N/q) cycles), and the interleaving
 *   offset spurs at k·R/M (k ≤ M/2: k and M − k fold to one place, one real
 *   tone). The interleaving images are not tones: the capture makes them by
 *   sampling with M mismatched cores (see interleaveMismatch).
 * Phases are drawn from a fixed seed; DC and rate/2 are in phase (a real
 * component there has no quadrature part).
 *
 * @param scenario the validated scenario (not moved)
 * @param record rate, length and wanted tone count
 * @param layout offsets of the wanted and neighbour tones, whole cycles
 * @returns the tones: inputs first (wanted, neighbours, board spurs), then the spurs added after the converter
 * @example captureTones(s, { rate: hz(184.32e6), samples: 65536, wantedTones: 1 }, { wanted: [], neighbours: [] })[0].label // 'W1'
 */
export function captureTones(scenario: Scenario, record: CaptureRecord, layout: ToneLayout): CaptureTone[] {
  const { rate, samples } = record;
  const phase = seededUniform(PHASE_SEED);
  const tones: CaptureTone[] = [];
  const add = (label: string, source: ToneSource, input: boolean, nominal: number, cycles: number, level: number, inPhase = false) => {
    const frequency = cyclesFrequency(cycles, rate, samples);
    const drawn = 2 * Math.PI * phase();
    tones.push({
      label,
      source,
      input,
      nominal: hz(nominal),
      cycles,
      frequency,
      move: hz(frequency - nominal),
      level: db(level),
      amplitude: 10 ** (level / 20),
      phase: inPhase ? 0 : drawn,
    });
  };
  const n = record.wantedTones;
  toneBands(scenario).forEach((band, channel) => {
    const level = wantedToneLevel(band, n);
    wantedNominals(band, n).forEach((f, i) => {
      const cycles = nearestCycles(f, rate, samples) + (layout.wanted[channel * n + i] ?? 0);
      add(`${band.prefix}${i + 1}`, { kind: 'wanted', index: i, channel }, true, f, cycles, level);
    });
  });
  // A tone source is attenuated at the frequency it is synthesised at (where the re-derived plan puts it); a band over its extent.
  const at = (low: number, high: number, cycles: number) =>
    low === high
      ? ([cyclesFrequency(cycles, rate, samples), cyclesFrequency(cycles, rate, samples)] as const)
      : ([hz(low), hz(high)] as const);
  scenario.neighbours.forEach((n, i) => {
    const centre = (n.low + n.high) / 2;
    const cycles = nearestCycles(centre, rate, samples) + (layout.neighbours[i] ?? 0);
    const level = n.level - leastAttenuation(scenario.filter, ...at(n.low, n.high, cycles));
    add(n.label, { kind: 'neighbour', index: i }, true, centre, cycles, level);
  });
  scenario.boardSpurs.forEach((spur, i) => {
    const centre = (spur.low + spur.high) / 2;
    const cycles = nearestCycles(centre, rate, samples);
    for (let h = 1; h <= Math.max(1, spur.harmonics); h++) {
      const loss =
        spur.coupling === 'before-filter' ? leastAttenuation(scenario.filter, ...at(h * spur.low, h * spur.high, h * cycles)) : 0;
      add(
        h === 1 ? spur.label : `${spur.label} H${h}`,
        { kind: 'board spur', index: i, harmonic: h },
        true,
        h * centre,
        h * cycles,
        spur.level - 20 * Math.log10(h) - loss,
      );
    }
  });
  const { dc, halfRate, quarterRate, fractions } = scenario.converter.rateSpurs;
  const rateSpur = (numerator: number, denominator: number, level: number) => {
    const cycles = Math.round((numerator * samples) / denominator);
    const onEdge = foldCycles(cycles, samples) === 0 || foldCycles(cycles, samples) === samples / 2;
    add(
      rateFractionLabel(numerator, denominator),
      { kind: 'rate spur', numerator, denominator },
      false,
      (numerator * rate) / denominator,
      cycles,
      level,
      onEdge,
    );
  };
  if (dc !== null) rateSpur(0, 1, dc);
  if (halfRate !== null) add('rate/2', { kind: 'rate spur', numerator: 1, denominator: 2 }, false, rate / 2, samples / 2, halfRate, true);
  if (quarterRate !== null) add('rate/4', { kind: 'rate spur', numerator: 1, denominator: 4 }, false, rate / 4, samples / 4, quarterRate);
  for (const spur of fractions ?? []) rateSpur(spur.numerator, spur.denominator, spur.level);
  const interleave = scenario.converter.interleave;
  if (interleave !== null) {
    const m = interleave.ways;
    for (let k = 1; 2 * k <= m; k++) {
      add(
        `IL offset ${k}/${m}`,
        { kind: 'interleave offset', k },
        false,
        (k * rate) / m,
        Math.round((k * samples) / m),
        interleave.offsetSpur,
        2 * k === m,
      );
    }
  }
  return tones;
}
