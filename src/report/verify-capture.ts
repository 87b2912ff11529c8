import { db, hz, ppm, type Db, type Hz } from '../units/quantities.js';
import { quantityText } from '../text/quantity-text.js';
import type { Scenario } from '../scenario/scenario.js';
import { contextFromScenario } from '../solve/context-from-scenario.js';
import { evaluateRate, type CheckResult, type RateEvaluation } from '../solve/evaluate-rate.js';
import { channelPlans } from '../solve/plan-context.js';
import type { Interferer } from '../interferers/interferer.js';
import { levelThreshold } from '../interferers/level-threshold.js';
import { foldExtent } from '../math/fold-extent.js';
import { PAPER_DESIGN_CAUTION } from '../plan/caution.js';
import { planAtRate } from '../plan/plan-at-rate.js';
import { channelCheckLabel, limitText } from '../solve/limited-by.js';
import { binDistance, foldCycles } from '../capture/coherent-bins.js';
import { captureTones, movedScenario, type CaptureRecord, type CaptureTone } from '../capture/capture-tones.js';
import { checkFamily, type LineFamily } from '../capture/check-families.js';
import { converterCoefficients } from '../capture/converter-model.js';
import { familyLines, inputIndex, type InputIndex } from '../capture/family-lines.js';
import { coreMismatch, type CoreMismatch } from '../capture/interleave-mismatch.js';
import { simulateCapture, type SimulatedConverter } from '../capture/simulate-capture.js';
import { FIND_ABOVE_FLOOR, judgeLine, SEARCH_BINS, type Measurement } from './judge-line.js';
import { enumerateProducts, orderSupremums, productAmplitude, productBound } from '../capture/mixing-products.js';
import { expectedNoiseLevel } from '../capture/noise-level.js';
import { imageKey, modelComponents, type ModelComponent } from '../capture/model-components.js';
import { chooseLayout, type ComponentTemplate } from '../capture/tone-layout.js';
import { blackmanHarris } from '../capture/window.js';
import {
  CONTRADICTING,
  type PeakRow,
  type PredictionRow,
  type ToneRow,
  type UnderFloor,
  type VerifiedChannel,
  type VerifyResult,
} from './verify-result.js';

/** The result's words (notes, contradictions, what was compared) are read in the terminal and the JSON: written as the terminal writes numbers. */
const T = quantityText('terminal');

/** How one capture is taken. */
export interface CaptureSettings {
  /** Sample rate R, Hz, inside the converter's range. */
  readonly rate: Hz;
  /** Record length N, a power of two (default 65536). */
  readonly samples?: number;
  /** Tones across the wanted band, ≥ 1 (default 3). */
  readonly wantedTones?: number;
  /** Level tolerance, dB (default 1). */
  readonly tolerance?: Db;
}

/** Products weaker than the median bin by this much are left out of the model's list, dB. */
const CUTOFF_BELOW_MEDIAN = 30;
/** Up to this many lines in one check, the strongest of those under the floor is computed exactly for the summary; beyond, only counted. */
const UNDER_FLOOR_EXACT = 64;

/**
 * A simulated capture of a scenario at one rate, set beside the plan there.
 *
 * The capture: the tones of captureTones (moved to whole cycles of the
 * record; the plan re-derived at the moved tone sources), through the fitted
 * converter polynomial, quantised to the converter's bits with one step of
 * uniform dither, the rate-tied spurs added, windowed (4-term
 * Blackman–Harris) and transformed with this module's own FFT. The plan:
 * evaluateRate at R with no drift. Each interferer of the plan is matched to
 * the tones or products that stand for it (checkFamily), each line judged
 * (judgeLine); measured peaks that no line explains are listed, and those
 * above the threshold contradict the plan; so does any peak above the
 * threshold inside the wanted image, or within the margin of it that the
 * interferer it stands for must keep (its own, its kind's or the scenario's).
 *
 * @param scenario the validated scenario
 * @param settings rate, record length, wanted tones, tolerance
 * @returns the result; consistent is false when the capture contradicts the plan
 * @throws RangeError for a record that is not a power of two ≥ 1024, or no wanted tone
 * @example verifyCapture(heronBase, { rate: hz(184.32e6), wantedTones: 1 }).consistent // true (at a rate the solver passes)
 */
export function verifyCapture(scenario: Scenario, settings: CaptureSettings): VerifyResult {
  return verifyCaptureWithSpectrum(scenario, settings).result;
}

/** The result of verifyCapture beside the measured spectrum it was judged on. */
export interface VerifiedCapture {
  readonly result: VerifyResult;
  /** Level of bins 0..N/2 (bin k at k·R/N), dBFS, as levelSpectrum reads them; kept out of the result so its JSON stays small. */
  readonly levels: Float64Array;
}

/**
 * verifyCapture, also handing back the measured spectrum (for a picture).
 *
 * @param scenario the validated scenario
 * @param settings rate, record length, wanted tones, tolerance
 * @returns the result and the N/2 + 1 bin levels in dBFS
 * @throws RangeError as verifyCapture
 * @example verifyCaptureWithSpectrum(heronBase, { rate: hz(184.32e6), samples: 1024 }).levels.length // 513
 */
export function verifyCaptureWithSpectrum(scenario: Scenario, settings: CaptureSettings): VerifiedCapture {
  const samples = settings.samples ?? 65536;
  const wantedTones = settings.wantedTones ?? 3;
  const tolerance = settings.tolerance ?? db(1);
  if (!(samples >= 1024 && (samples & (samples - 1)) === 0))
    throw new RangeError(`the record must be a power of two of at least 1024 samples, got ${samples}`);
  if (!(Number.isInteger(wantedTones) && wantedTones >= 1)) throw new RangeError(`at least one wanted tone, got ${wantedTones}`);
  const { rate } = settings;
  const record: CaptureRecord = { rate, samples, wantedTones };
  const mismatch = scenario.converter.interleave ? coreMismatch(scenario.converter.interleave) : null;

  // The plan as written, and re-derived at the frequencies the record can hold.
  const plan = planAtRate(scenario, rate, ppm(0));
  const movedContext = contextFromScenario(movedScenario(scenario, record));
  const checks = evaluateRate(movedContext, rate, ppm(0)).checks;
  // With several channels every channel's checks, labelled `channel: check`, each against its own channel's threshold.
  const sides = channelPlans(movedContext);
  const interferers =
    sides.length > 1
      ? sides.flatMap((side) => side.interferers.map((i) => ({ ...i, label: channelCheckLabel(side.label ?? '', i.label) })))
      : movedContext.interferers;
  const thresholds = sides.length > 1 ? sides.flatMap((side) => side.interferers.map(() => side.levelThreshold as number)) : null;
  const claimed = new Set<number>();
  const firstTones = captureTones(scenario, record, { wanted: [], neighbours: [] });
  const families = interferers.map((i) => checkFamily(i, firstTones, samples, claimed));
  const converter = { bits: scenario.converter.bits, coefficients: converterCoefficients(scenario), mismatch };
  const window = blackmanHarris(samples);
  const expectedNoise = expectedNoiseLevel(scenario.converter.bits, samples, window.noiseBandwidthBins, true);
  const tones = captureTones(
    scenario,
    record,
    chooseLayout(scenario, record, layoutComponents(firstTones, families, converter.coefficients, mismatch, record, expectedNoise)),
  );

  // The capture, the model's components, each line of the plan judged, and the peaks no line accounts for.
  const capture = simulateCapture(tones, samples, rate, converter, window);
  const index = inputIndex(tones);
  const cutoff = 10 ** (Math.max(capture.spectrum.medianLevel - CUTOFF_BELOW_MEDIAN, -240) / 20);
  const model = modelComponents(tones, index, converter.coefficients, samples, cutoff, mismatch ? { mismatch, rate } : null);
  // The lowest threshold over the channels: an unexplained peak above it matters to one of them.
  const threshold = sides.length > 1 ? db(Math.min(...sides.map((side) => side.levelThreshold))) : levelThreshold(scenario);
  const edgeKeys = new Set(
    tones.flatMap((t, i) => (!t.input && (t.cycles === 0 || foldCycles(t.cycles, samples) === samples / 2) ? [`t:${i}`] : [])),
  );
  const measurement: Measurement = {
    levels: capture.spectrum.levels,
    peaks: capture.peaks,
    floor: capture.floor,
    threshold,
    tolerance,
    components: model.components,
    edgeKeys,
  };
  const judged = judgeChecks({ checks, interferers, families, tones, index, converter, record, thresholds }, measurement);
  const channelSides = verifiedChannels(scenario, plan, sides, judged.predictions, checks, rate);
  const image = channelSides[0]!.image;
  const peaks = sortPeaks(measurement, judged, channelSides, record);
  const several = channelSides.length > 1;
  const judgedChannels = channelSides.map((side, c) => {
    const own = (label: string) => !several || label.startsWith(`${side.label}: `);
    const sidePlan = { pass: side.pass, checks: plan.checks.filter((k) => own(k.label)) };
    const placement = several ? tonePlacement(side, c, tones, measurement, record) : null;
    const prefix = `${side.label}: `;
    // A channel's words name its checks without the channel (its own label heads them once, in the list of all).
    const words = [
      ...(placement?.contradiction ? [placement.contradiction] : []),
      ...contradictionWords(
        judged.predictions.filter((p) => own(p.check)),
        { unlisted: [], intrusions: peaks.intrusions[c]! },
        threshold,
        side.marginAt,
        sidePlan,
        several ? `the ${side.label} image` : 'the wanted image',
      ),
    ].map((w) => (several && w.startsWith(prefix) ? w.slice(prefix.length) : w));
    return { side, placement, words };
  });
  const unlistedWords = contradictionWords(
    [],
    { unlisted: peaks.unlisted, intrusions: [] },
    threshold,
    channelSides[0]!.marginAt,
    plan,
    '',
  );
  // One channel: its words in the order they always had (lines, unlisted peaks, intrusions); several: each channel's, then the unlisted peaks.
  const contradictions = several
    ? [...judgedChannels.flatMap((j) => j.words.map((w) => `${j.side.label}: ${w}`)), ...unlistedWords]
    : contradictionWords(
        judged.predictions,
        { unlisted: peaks.unlisted, intrusions: peaks.intrusions[0]! },
        threshold,
        channelSides[0]!.marginAt,
        plan,
        'the wanted image',
      );
  const result: VerifyResult = {
    scenario: scenario.name,
    rate,
    samples,
    binWidth: hz(rate / samples),
    window: { name: window.name, coherentGain: window.coherentGain, noiseBandwidthBins: window.noiseBandwidthBins },
    wantedTones,
    converter: {
      bits: scenario.converter.bits,
      coefficients: converter.coefficients,
      dither: 'uniform, one step peak to peak, fixed seed',
      clippedSamples: capture.clippedSamples,
    },
    levels: { threshold, noiseMedian: db(capture.spectrum.medianLevel), floor: db(capture.floor), tolerance },
    margin: scenario.requirements.margin,
    wantedImage: image,
    tones: tones.map((t) => toneRow(t, samples)),
    predictions: judged.predictions,
    underFloor: judged.underFloor,
    unlisted: peaks.unlisted,
    intrusions: peaks.intrusions.flat(),
    channels: judgedChannels.map(({ side, placement, words }) => ({
      label: side.label,
      zone: side.zone,
      inverted: side.inverted,
      image: side.image,
      threshold: db(side.threshold),
      planPass: side.pass,
      tonesSeen: placement?.seen ?? null,
      order: placement?.order ?? null,
      intrusions: peaks.intrusions[judgedChannels.findIndex((j) => j.side === side)]!,
      contradictions: words,
      consistent: words.length === 0,
    })),
    plan: { pass: plan.pass, limitedBy: limitText(plan.limitedBy), limitedByKind: plan.limitedBy.kind, worstMargin: plan.worstMargin },
    notSimulated: judged.notSimulated,
    contradictions,
    consistent: contradictions.length === 0,
    modelComplete: model.complete,
    compared: comparedText(
      several ? channelSides.map((c) => c.label) : [],
      wantedTones,
      tolerance,
      capture.floor,
      threshold,
      model.complete,
      mismatch !== null,
    ),
    caution: `${PAPER_DESIGN_CAUTION} A simulated capture is still a paper check: it is built from the same stated figures as the plan, so confirm the plan by measurement on hardware.`,
  };
  return { result, levels: capture.spectrum.levels };
}

/** What the lines of the plan are drawn from: the checks at the moved scenario, their families, the record's tones and the converter. */
interface PlanLines {
  readonly checks: readonly CheckResult[];
  readonly interferers: readonly Interferer[];
  readonly families: readonly LineFamily[];
  readonly tones: readonly CaptureTone[];
  readonly index: InputIndex;
  readonly converter: SimulatedConverter;
  readonly record: CaptureRecord;
  /** Per check, the threshold of the channel it is judged against (several channels); null: the measurement's. */
  readonly thresholds: readonly number[] | null;
}

/** Each check's lines judged against the capture, the lines under the floor summarised per check, and the checks nothing stands for. */
interface JudgedChecks {
  readonly predictions: PredictionRow[];
  readonly underFloor: UnderFloor[];
  readonly notSimulated: string[];
  /** The model components that some line of the plan names. */
  readonly lineKeys: ReadonlySet<string>;
}

function judgeChecks(lines: PlanLines, measurement: Measurement): JudgedChecks {
  const { tones, index, converter, record } = lines;
  const { coefficients, mismatch } = converter;
  const { rate, samples } = record;
  const amplitudes = index.inputs.map((i) => tones[i]!.amplitude);
  const bounds = orderSupremums(
    coefficients,
    amplitudes.reduce((sum, a) => sum + a, 0),
  );
  const lookedFor = 10 ** ((measurement.floor + FIND_ABOVE_FLOOR) / 20);
  const judged: JudgedChecks = { predictions: [], underFloor: [], notSimulated: [], lineKeys: new Set<string>() };
  lines.checks.forEach((check, i) => {
    const interferer = lines.interferers[i]!;
    const family = lines.families[i]!;
    const drafts = familyLines(family, tones, index, samples);
    // A family whose every product is DC (the band's own differences with one wanted tone: a tone less itself) is simulated, with nothing to see.
    const simulated = family.kind === 'mixing' || family.kind === 'interleave image';
    if (drafts.length === 0 && !simulated) judged.notSimulated.push(check.label);
    let under = { lines: 0, strongest: -Infinity };
    for (const line of drafts) {
      (judged.lineKeys as Set<string>).add(line.component);
      // An image is its source product times the image factor at the source's frequency.
      const factor = line.sourceCycles === undefined || !mismatch ? 1 : mismatch.imageFactor((line.sourceCycles * rate) / samples);
      const exact = (net: readonly number[]) => factor * Math.abs(productAmplitude(coefficients, amplitudes, net));
      // The cheap bound first: most products of many tones at high orders are far under the floor.
      const amplitude =
        line.net === null
          ? tones[line.tone!]!.amplitude
          : factor * productBound(bounds, amplitudes, line.net) < lookedFor
            ? null
            : exact(line.net);
      if (amplitude === null || amplitude < lookedFor) {
        const strongest = drafts.length <= UNDER_FLOOR_EXACT ? 20 * Math.log10(amplitude ?? exact(line.net!)) : -Infinity;
        under = { lines: under.lines + 1, strongest: Math.max(under.strongest, strongest) };
        continue;
      }
      const width = interferer.low === interferer.high ? 'tone' : 'band';
      const basis = levelBasis(family, record.wantedTones, mismatch);
      const against = lines.thresholds ? { ...measurement, threshold: lines.thresholds[i]! } : measurement;
      judged.predictions.push(
        judgeLine(
          { check, line, width, basis, amplitude, samples, binWidth: rate / samples, bin: foldCycles(line.cycles, samples) },
          against,
        ),
      );
    }
    if (under.lines > 0)
      judged.underFloor.push({
        check: check.label,
        lines: under.lines,
        strongest: Number.isFinite(under.strongest) ? db(under.strongest) : null,
      });
  });
  return judged;
}

/**
 * The margin a peak must keep from the wanted image, by bin: a peak the plan
 * names keeps that interferer's own required margin (the least, when several
 * lines sit there); any other the scenario's.
 */
function peakMargins(predictions: readonly PredictionRow[], checks: readonly CheckResult[], scenarioMargin: Hz): (bin: number) => Hz {
  const requiredOf = new Map(checks.map((c) => [c.label, c.requiredMargin] as const));
  return (bin) => {
    const own = predictions.flatMap((p) => (p.measured?.bin === bin ? [requiredOf.get(p.check) ?? scenarioMargin] : []));
    return own.length > 0 ? hz(Math.min(...own)) : scenarioMargin;
  };
}

/** One channel as the verdict sees it: the plan's zone, image and verdict there, its threshold and the margin a peak must keep from it. */
interface ChannelSide {
  readonly label: string;
  readonly low: Hz;
  readonly high: Hz;
  readonly zone: number | null;
  readonly inverted: boolean | null;
  /** The channel after sampling, [low, high] segments, Hz (one segment unless it straddles a zone edge). */
  readonly image: ReadonlyArray<readonly [Hz, Hz]>;
  /** This channel's weakest level less its rejection, dBFS. */
  readonly threshold: number;
  readonly pass: boolean;
  readonly marginAt: (bin: number) => Hz;
}

/** The wanted band, or each of several channels, as the plan puts it at this rate. */
function verifiedChannels(
  scenario: Scenario,
  plan: RateEvaluation,
  sides: ReadonlyArray<{ readonly levelThreshold: number }>,
  predictions: readonly PredictionRow[],
  checks: readonly CheckResult[],
  rate: Hz,
): ChannelSide[] {
  const imageOf = (e: { readonly image: { readonly low: Hz; readonly high: Hz } | null }, band: { low: Hz; high: Hz }) =>
    e.image ? [[e.image.low, e.image.high] as const] : foldExtent(band.low, band.high, rate).map((s) => [hz(s.low), hz(s.high)] as const);
  if (!plan.channels || scenario.channels.length <= 1)
    return [
      {
        label: 'wanted',
        low: scenario.wanted.low,
        high: scenario.wanted.high,
        zone: plan.zone,
        inverted: plan.inverted,
        image: imageOf(plan, scenario.wanted),
        threshold: levelThreshold(scenario),
        pass: plan.pass,
        marginAt: peakMargins(predictions, checks, scenario.requirements.margin),
      },
    ];
  return plan.channels.map((e, c) => {
    const channel = scenario.channels[c]!;
    const own = (label: string) => label.startsWith(`${channel.label}: `);
    return {
      label: channel.label,
      low: channel.low,
      high: channel.high,
      zone: e.zone,
      inverted: e.inverted,
      image: imageOf(e, channel),
      threshold: sides[c]!.levelThreshold,
      pass: e.pass,
      marginAt: peakMargins(
        predictions.filter((p) => own(p.check)),
        checks.filter((k) => own(k.label)),
        channel.requirements.margin,
      ),
    };
  });
}

/**
 * Peaks no line accounts for, and, per channel, peaks above its threshold
 * inside its image or within their margin of it. A channel's own tones are
 * its signal; another channel's tones are, to it, like any other peak.
 */
function sortPeaks(
  measurement: Measurement,
  judged: JudgedChecks,
  channels: readonly ChannelSide[],
  record: CaptureRecord,
): { unlisted: PeakRow[]; intrusions: PeakRow[][] } {
  const { samples } = record;
  const binWidth = record.rate / samples;
  const distanceTo = (image: ChannelSide['image'], f: number) =>
    Math.min(...image.map(([low, high]) => (f < low ? low - f : f > high ? f - high : 0)));
  const matched = new Set(judged.predictions.flatMap((p) => (p.measured ? [p.measured.bin] : [])));
  const strictlyInside = (image: ChannelSide['image'], f: number) => image.some(([low, high]) => f > low && f < high);
  const unlisted: PeakRow[] = [];
  const intrusions: PeakRow[][] = channels.map(() => []);
  for (const bin of measurement.peaks) {
    const level = db(measurement.levels[bin]!);
    const owner = strongestWithin(measurement.components, bin, 1, samples);
    const ownChannel = owner?.wanted ? (owner.channel ?? 0) : null;
    if (ownChannel !== null && channels.length === 1) continue;
    const f = bin * binWidth;
    const row = {
      frequency: hz(f),
      bin,
      level,
      explainedBy: null as string | null,
      distance: hz(Math.min(...channels.map((c) => distanceTo(c.image, f)))),
    };
    if (ownChannel === null && !matched.has(bin) && !(owner && judged.lineKeys.has(owner.key))) {
      const beside = strongestWithin(measurement.components, bin, SEARCH_BINS, samples);
      row.explainedBy = owner
        ? `${owner.name} (order ${owner.order}), a product the plan does not list`
        : beside && beside.amplitude >= 10 ** (level / 20)
          ? `window overlap with ${beside.name}`
          : null;
      unlisted.push(row);
    }
    channels.forEach((side, c) => {
      if (c === ownChannel) return;
      const distance = hz(distanceTo(side.image, f));
      const explainedBy = ownChannel === null ? row.explainedBy : `${owner!.name}, a tone of channel ${channels[ownChannel]!.label}`;
      if (level > side.threshold && (distance < side.marginAt(bin) || strictlyInside(side.image, f)))
        intrusions[c]!.push(channels.length === 1 ? row : { ...row, distance, explainedBy });
    });
  }
  return { unlisted, intrusions };
}

/**
 * Where a channel's own tones show in the capture, set beside the plan's
 * image of that channel: each tone's peak (its own whole-cycle fold, ±1
 * bin) measured, and the order of the measured places against the order of
 * the tones at the input (rising: upright; falling: inverted). Contradicts
 * the plan when a tone the capture shows lies outside the plan's image, or
 * the order says the other inversion. A channel straddling a zone edge (no
 * single image) is only measured.
 */
function tonePlacement(
  side: ChannelSide,
  channel: number,
  tones: readonly CaptureTone[],
  measurement: Measurement,
  record: CaptureRecord,
): { seen: number; order: NonNullable<VerifiedChannel['order']>; contradiction: string | null } {
  const { samples } = record;
  const binWidth = record.rate / samples;
  const own = tones.filter((t) => t.source.kind === 'wanted' && t.source.channel === channel).sort((a, b) => a.frequency - b.frequency);
  const peaks = new Set(measurement.peaks);
  const seen = own.flatMap((t) => {
    const bin = foldCycles(t.cycles, samples);
    const found = [bin, bin - 1, bin + 1].find((b) => peaks.has(b));
    return found === undefined ? [] : [{ tone: t, bin: found }];
  });
  const rising = seen.every((p, i) => i === 0 || p.bin > seen[i - 1]!.bin);
  const falling = seen.every((p, i) => i === 0 || p.bin < seen[i - 1]!.bin);
  const order: NonNullable<VerifiedChannel['order']> =
    seen.length === 0 ? 'unseen' : seen.length === 1 ? 'one tone' : rising ? 'upright' : falling ? 'inverted' : 'folded';
  if (side.zone === null || side.image.length !== 1) return { seen: seen.length, order, contradiction: null };
  const [[low, high]] = side.image as [readonly [Hz, Hz]];
  const outside = seen.filter((p) => p.bin * binWidth < low - binWidth || p.bin * binWidth > high + binWidth);
  if (outside.length > 0) {
    const names = outside.map((p) => `${p.tone.label} at ${T.frequency(p.bin * binWidth)}`).join(', ');
    return {
      seen: seen.length,
      order,
      contradiction: `${names} outside the plan's image ${T.extent(low, high)} (zone ${side.zone})`,
    };
  }
  if (seen.length > 1 && order !== (side.inverted ? 'inverted' : 'upright'))
    return {
      seen: seen.length,
      order,
      contradiction: `the tones show the channel ${order}, the plan says zone ${side.zone}${side.inverted ? ' (inverted)' : ''}`,
    };
  return { seen: seen.length, order, contradiction: null };
}

/** Each reason the capture contradicts the plan, in words. */
function contradictionWords(
  predictions: readonly PredictionRow[],
  peaks: { unlisted: readonly PeakRow[]; intrusions: readonly PeakRow[] },
  threshold: number,
  marginAt: (bin: number) => Hz,
  plan: { readonly pass: boolean; readonly checks: ReadonlyArray<{ readonly label: string; readonly pass: boolean }> },
  imageName: string,
): string[] {
  return [
    ...predictions.filter((p) => CONTRADICTING.has(p.status)).map((p) => `${p.check} (${p.line}): ${p.status}: ${p.note}`),
    ...peaks.unlisted
      .filter((u) => u.level > threshold && !(u.explainedBy ?? '').startsWith('window overlap'))
      .map(
        (u) =>
          `${T.frequency(u.frequency)} at ${T.level(u.level)} dBFS, above the threshold ${T.level(threshold)} dBFS: ${u.explainedBy ?? 'unexplained'}; missed by the plan`,
      ),
    // An intrusion confirms a failing plan when it is a line of a check the plan itself fails at this rate.
    ...peaks.intrusions
      .filter((u) => plan.pass || !failingLine(predictions, plan, u.bin))
      .map((u) => {
        const where =
          u.distance === 0
            ? `lies inside ${imageName}`
            : `lies ${T.frequency(u.distance)} from ${imageName}, inside the ${T.frequency(marginAt(u.bin))} margin`;
        return `${T.frequency(u.frequency)} at ${T.level(u.level)} dBFS (${u.explainedBy ?? lineName(predictions, u.bin)}) ${where}: the rate is not clean`;
      }),
  ];
}

/**
 * What the layout keeps apart: the plan's lines and the wanted tones
 * (watched), and the model's products strong enough to show (above the
 * expected mean noise), which must not land on a watched line.
 */
function layoutComponents(
  tones: readonly CaptureTone[],
  families: readonly LineFamily[],
  coefficients: readonly number[],
  mismatch: CoreMismatch | null,
  record: CaptureRecord,
  noiseLevel: number,
): ComponentTemplate[] {
  const { samples, rate } = record;
  const index = inputIndex(tones);
  const watched = new Map<string, ComponentTemplate>();
  const amplitudes = index.inputs.map((i) => tones[i]!.amplitude);
  const bounds = orderSupremums(
    coefficients,
    amplitudes.reduce((sum, a) => sum + a, 0),
  );
  const visible = 10 ** (noiseLevel / 20);
  const factorOf = (line: { sourceCycles?: number }) =>
    line.sourceCycles === undefined || !mismatch ? 1 : mismatch.imageFactor((line.sourceCycles * rate) / samples);
  for (const family of families) {
    for (const line of familyLines(family, tones, index, samples)) {
      if (line.net !== null && factorOf(line) * productBound(bounds, amplitudes, line.net) < visible) continue; // under the noise: its place does not matter
      watched.set(line.component, {
        key: line.component,
        net: line.net,
        tone: line.tone,
        watched: true,
        ...(line.offset === undefined ? {} : { offset: line.offset }),
      });
    }
  }
  index.inputs.forEach((tone, p) => {
    if (tones[tone]!.source.kind !== 'wanted') return;
    const net = index.inputs.map((_, q) => (q === p ? 1 : 0));
    watched.set(`n:${net.join(',')}`, { key: `n:${net.join(',')}`, net, tone: null, watched: true });
  });
  const products = enumerateProducts(coefficients, amplitudes, visible).products;
  const others: ComponentTemplate[] = products.map((p) => ({ key: `n:${p.net.join(',')}`, net: p.net, tone: null, watched: false }));
  if (mismatch) {
    for (const p of products) {
      const cycles = p.net.reduce((sum, n, i) => sum + n * tones[index.inputs[i]!]!.cycles, 0);
      if (p.amplitude * mismatch.imageFactor((cycles * rate) / samples) < visible) continue;
      for (let k = 1; k < mismatch.ways; k++)
        others.push({ key: imageKey(k, p.net), net: p.net, tone: null, watched: false, offset: Math.round((k * samples) / mismatch.ways) });
    }
  }
  return [...watched.values(), ...others.filter((c) => !watched.has(c.key))];
}

/** `plan` where the plan's level is the level the capture puts there; `bound` where it is a band's worst case or an extrapolation. */
function levelBasis(family: LineFamily, wantedTones: number, mismatch: CoreMismatch | null): 'plan' | 'bound' {
  if (family.kind === 'tone') return 'plan';
  if (family.kind !== 'mixing' && family.kind !== 'interleave image') return 'bound';
  const [only, ...more] = family.terms;
  if (only === undefined || more.length > 0 || only.minus > 0) return 'bound';
  // What the capture puts there: a tone source itself, and with one wanted tone the band's harmonics (quoted at its strongest level).
  const capturedAsPlanned = only.signal === 'wanted' ? wantedTones === 1 : only.plus === 1;
  if (family.kind === 'mixing') return capturedAsPlanned ? 'plan' : 'bound';
  // An image under a timing skew is quoted at a band's highest frequency: a bound unless the source is one tone.
  const flat = mismatch === null || mismatch.skews.every((tau) => tau === 0);
  return capturedAsPlanned && only.plus === 1 && (flat || only.signal !== 'wanted') ? 'plan' : 'bound';
}

/** The plan's line measured on a bin, in words, or 'not named'. */
function lineName(predictions: readonly PredictionRow[], bin: number): string {
  const row = predictions.find((p) => p.measured?.bin === bin);
  // A tone's line carries its check's own label: name it once.
  return row ? (row.line === row.check ? row.check : `${row.check}, ${row.line}`) : 'not named';
}

/** Whether the peak on this bin is a line of a check that the plan fails at this rate. */
function failingLine(
  predictions: readonly PredictionRow[],
  plan: { readonly checks: ReadonlyArray<{ readonly label: string; readonly pass: boolean }> },
  bin: number,
): boolean {
  const row = predictions.find((p) => p.measured?.bin === bin);
  return row !== undefined && plan.checks.some((c) => c.label === row.check && !c.pass);
}

function strongestWithin(components: readonly ModelComponent[], bin: number, reach: number, samples: number): ModelComponent | null {
  let best: ModelComponent | null = null;
  for (const c of components) if (binDistance(c.bin, bin, samples) <= reach && (best === null || c.amplitude > best.amplitude)) best = c;
  return best;
}

function toneRow(tone: CaptureTone, samples: number): ToneRow {
  const role =
    tone.source.kind === 'wanted'
      ? 'wanted'
      : tone.source.kind === 'neighbour'
        ? 'neighbour'
        : tone.source.kind === 'board spur'
          ? 'board spur'
          : 'converter';
  return {
    label: tone.label,
    role,
    nominal: tone.nominal,
    frequency: tone.frequency,
    move: tone.move,
    bin: foldCycles(tone.cycles, samples),
    level: tone.level,
  };
}

function comparedText(
  channels: readonly string[],
  wantedTones: number,
  tolerance: number,
  floor: number,
  threshold: number,
  complete: boolean,
  interleaved: boolean,
): string {
  const wanted =
    wantedTones === 1
      ? 'one tone at the strongest wanted level'
      : `${wantedTones} tones, each 20·log10(${wantedTones}) dB below the strongest wanted level`;
  const represented =
    channels.length > 1
      ? `Each of the ${channels.length} channels (${channels.join(', ')}) is represented by ${wanted.replace('the strongest wanted level', "that channel's strongest level")}`
      : `The wanted band is represented by ${wanted}`;
  const lines = [
    `The plan at this rate (no drift) against a simulated capture. ${represented}, each band neighbour by one tone at its centre at its level after the filter.`,
    "Tone sources (board spurs and their harmonics, tone neighbours, rate-tied converter spurs) were moved to the nearest whole number of cycles in the record (moves listed) and the plan was re-derived there; for each, the plan's aliased position is compared with the measured peak.",
    "Band sources are represented by their tones: each mixing product the plan lists was formed from its recipe (every choice of the signals' tones with the listed plus and minus counts, e.g. 3·W1, W1 + W2 − B1) by whole-cycle arithmetic, checked against the plan's aliased segments, and measured.",
    ...(interleaved
      ? [
          'The interleaving images were not added as tones: the capture samples with M cores whose gain (or, with a reference frequency, timing) differs by just enough to make the stated image level, so every input tone and product has its images at k·R/M ± f.',
        ]
      : []),
    ...(wantedTones === 1 ? ['With one wanted tone the differences inside the wanted band make no line: a tone less itself is DC.'] : []),
    ...(channels.length > 1
      ? [
          "Each channel's checks are judged against that channel's threshold. Where each channel's tones show must lie in the plan's image of that channel (within one bin), in rising order for an upright zone and falling for an inverted one; a peak above a channel's threshold inside its image or within its margin (another channel's tones included) contradicts the plan unless it is a line of a check the plan fails there.",
        ]
      : []),
    `Positions must agree within one bin. Levels are judged ${T.decibels(tolerance)} dB either way where the plan's level is the level the capture put there (stated spurs, neighbours, and with one wanted tone its harmonics and images); where the plan's level is a band's worst case or an extrapolation (neighbour harmonics, intermodulation, several wanted tones), the measurement must not exceed it by more than ${T.decibels(tolerance)} dB when above the threshold.`,
    `Peaks above ${T.level(floor)} dBFS count; any above the threshold ${T.level(threshold)} dBFS that no line of the plan explains, or that lands inside the wanted image or within the margin its interferer must keep from it (unless it is a line of a check the plan fails at this rate, which confirms the plan's failure), contradicts the plan.`,
  ];
  if (!complete)
    lines.push(
      "The list of the model's products was cut short at its budget: an unexplained peak may be a product of high order the list does not name.",
    );
  if (floor > threshold)
    lines.push(`The floor is above the threshold: spurs between ${T.level(threshold)} and ${T.level(floor)} dBFS are not seen.`);
  return lines.join(' ');
}
