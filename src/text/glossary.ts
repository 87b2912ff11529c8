/*
 * The words of every table and the abbreviations the outputs use, in plain
 * words with their units: one list that `--help` of each command and the
 * legend of the HTML review page both read. A test reads each table's
 * headers as drawn (terminal, CSV, HTML) and fails on one this list does
 * not explain, so a new column comes with its entry.
 */

/** The commands whose output the glossary explains. */
export type GlossaryCommand = 'windows' | 'alias' | 'solve' | 'compare' | 'report' | 'verify';

/** One word of the outputs. */
export interface GlossaryEntry {
  /** As the tables write it (a column header) or as it stands in the text (an abbreviation). */
  readonly term: string;
  /** What it means, in plain words. */
  readonly meaning: string;
  /** The unit its figures are written in; absent for words, counts and verdicts. */
  readonly unit?: string;
  /** A column header, or an abbreviation that may stand anywhere in the text. */
  readonly kind: 'column' | 'abbreviation';
  /** The commands whose output shows it (their --help lists it; `report` is the HTML page). */
  readonly commands: readonly GlossaryCommand[];
  /**
   * How to find it when it carries a number or stands inside other text
   * (H2, IM3, band 2, r/4): a header must match the whole pattern, an
   * abbreviation is looked for anywhere. Absent: the term itself.
   */
  readonly matches?: RegExp;
  /** CSV columns (`compare --csv`) that carry the same figure, in full precision. */
  readonly csv?: readonly string[];
  /** Other spellings of the same thing that the documentation must not use (the tables never do). */
  readonly avoid?: readonly string[];
}

const PLAN: readonly GlossaryCommand[] = ['solve', 'report'];
const PARTS: readonly GlossaryCommand[] = ['solve', 'compare', 'report'];
/** Commands whose output names interferers by their labels. */
const LABELS: readonly GlossaryCommand[] = [...PARTS, 'verify'];
const WINDOWS: readonly GlossaryCommand[] = ['windows', 'solve', 'report'];

/** Every column header and abbreviation of the outputs, in the order --help lists them. */
export const GLOSSARY: readonly GlossaryEntry[] = [
  // Windows and feasible intervals.
  {
    term: 'zone',
    kind: 'column',
    commands: ['windows', 'alias', ...PARTS, 'verify'],
    csv: ['zone'],
    meaning:
      'the Nyquist zone n the band (or tone) falls in: n·rate/2 is its upper edge; "2 inv": zone 2, inverted; "straddles": the band crosses a zone edge',
  },
  {
    term: 'inverted',
    kind: 'column',
    commands: ['windows', 'alias', ...PARTS],
    csv: ['inverted'],
    meaning: 'yes when the band (or tone) arrives spectrally inverted after sampling: in every even zone',
  },
  {
    term: 'legal rates',
    kind: 'column',
    commands: WINDOWS,
    meaning:
      'the window of sampling rates that hold the band with its guards whole in this zone, rounded inward so that every rate written lies inside',
    unit: 'Hz',
  },
  {
    term: 'width',
    kind: 'column',
    commands: WINDOWS,
    meaning: 'the width of the window or interval of rates (for several bands: "single rate" when it is one rate)',
    unit: 'Hz',
  },
  {
    term: 'drift at centre',
    kind: 'column',
    commands: WINDOWS,
    meaning: 'how far a clock at the centre of the window or interval may drift either way and stay inside it',
    unit: 'ppm, per cent above 10 000 ppm',
  },
  { term: 'centre rate', kind: 'column', commands: ['windows'], meaning: 'the rate at the centre of the window', unit: 'Hz' },
  {
    term: 'band lands at (centre)',
    kind: 'column',
    commands: ['windows'],
    meaning: 'where the band shows after sampling at the centre rate, between 0 and rate/2; "(mirrored)": inverted',
    unit: 'Hz',
  },
  {
    term: 'feasible rates',
    kind: 'column',
    commands: PLAN,
    meaning:
      'an interval of legal rates at which nothing strong enough to block lands within its required margin of the band, rounded inward',
    unit: 'Hz',
  },
  // Several bands through one converter (windows --band).
  { term: 'band', kind: 'column', commands: ['windows'], meaning: 'the number of the band, in the order the --band options give them' },
  {
    term: 'edges',
    kind: 'column',
    commands: ['windows', 'report'],
    meaning: 'the band (or channel) from its low to its high edge',
    unit: 'Hz',
  },
  { term: 'guard below', kind: 'column', commands: ['windows'], meaning: "the guard band kept free under the band's low edge", unit: 'Hz' },
  { term: 'guard above', kind: 'column', commands: ['windows'], meaning: "the guard band kept free over the band's high edge", unit: 'Hz' },
  {
    term: 'holding',
    kind: 'column',
    commands: ['windows'],
    meaning: 'the band with its guards: what must sit whole in one zone',
    unit: 'Hz',
  },
  {
    term: 'valid rates',
    kind: 'column',
    commands: ['windows'],
    meaning:
      'an interval of rates at which every band sits whole in a zone and no alias comes within the spacing of another, rounded inward',
    unit: 'Hz',
  },
  {
    term: 'band n',
    kind: 'column',
    commands: ['windows'],
    matches: /^band \d+$/,
    meaning: 'the zone band n falls in at those rates; "inv": inverted',
  },
  // alias.
  { term: 'frequency', kind: 'column', commands: ['alias'], meaning: 'the frequency given, at the converter input', unit: 'Hz' },
  {
    term: 'shows at',
    kind: 'column',
    commands: ['alias'],
    meaning: 'where it shows after sampling: its alias between 0 and rate/2',
    unit: 'Hz',
  },
  {
    term: 'cannot be told from',
    kind: 'column',
    commands: ['alias'],
    meaning: 'the other input frequencies k·rate ± alias (up to --multiples) that show at the same place',
    unit: 'Hz',
  },
  // The scenario's inputs on the review page.
  { term: 'wanted band', kind: 'column', commands: ['report'], meaning: 'the channel to receive, at the converter input', unit: 'Hz' },
  {
    term: 'guards',
    kind: 'column',
    commands: ['report'],
    meaning: 'the guard bands kept free below and above the wanted band, for the anti-alias filter',
    unit: 'Hz',
  },
  // Several channels through one converter.
  {
    term: 'weakest level dBFS',
    kind: 'column',
    commands: ['report'],
    meaning: "the channel's weakest level, at which its requirements apply",
    unit: 'dBFS',
  },
  { term: 'strongest level dBFS', kind: 'column', commands: ['report'], meaning: "the channel's strongest level", unit: 'dBFS' },
  {
    term: 'centre after sampling',
    kind: 'column',
    commands: ['report'],
    meaning: "where the channel's centre shows after sampling, between 0 and rate/2",
    unit: 'Hz',
  },
  {
    term: 'image (plan)',
    kind: 'column',
    commands: ['verify'],
    meaning: 'where the plan puts the channel after sampling, low to high edge',
    unit: 'Hz',
  },
  {
    term: 'tones seen',
    kind: 'column',
    commands: ['verify'],
    meaning: "how many of the channel's tones show as peaks in the capture, of those synthesised",
  },
  {
    term: 'order seen',
    kind: 'column',
    commands: ['verify'],
    meaning:
      "the order of those peaks against the tones' order at the input: upright (rising), inverted (falling), folded (neither), one tone (no order to see) or unseen",
  },
  {
    term: 'peaks on it',
    kind: 'column',
    commands: ['verify'],
    meaning: "measured peaks above the channel's threshold inside its image or within their margin of it",
  },
  {
    term: 'plan',
    kind: 'column',
    commands: ['verify'],
    meaning: "the plan's verdict for the channel at this rate, no drift: pass or FAIL",
  },
  {
    term: 'capture',
    kind: 'column',
    commands: ['verify'],
    meaning: 'whether the capture agrees with the plan for the channel, or contradicts it',
  },
  {
    term: 'threshold dBFS',
    kind: 'column',
    commands: ['verify'],
    meaning: "the channel's weakest level less its rejection: peaks above it must keep clear of the channel",
    unit: 'dBFS',
  },
  { term: 'rates searched', kind: 'column', commands: ['report'], meaning: "the converter's range of sampling rates", unit: 'Hz' },
  {
    term: 'goal',
    kind: 'column',
    commands: ['report'],
    meaning: 'how the rate of each feasible interval is chosen: widest-margin, lowest-rate, quarter-rate or decimation',
  },
  {
    term: 'interferer',
    kind: 'column',
    commands: ['report'],
    meaning:
      'a signal that can land on the band after sampling: a harmonic, a mixing product, a board spur, a neighbour channel or a converter spur',
  },
  {
    term: 'source',
    kind: 'column',
    commands: ['report'],
    meaning: 'where the interferer comes from, with the figure its level is derived from',
  },
  {
    term: 'input frequencies',
    kind: 'column',
    commands: ['report'],
    meaning: 'where the interferer sits at the converter input; with r, the sampling rate, when it moves with it (r/4, r − 38–2 MHz)',
    unit: 'Hz',
  },
  {
    term: 'required margin',
    kind: 'column',
    commands: ['report'],
    meaning: "the least distance the interferer's alias must keep from the band's alias",
    unit: 'Hz',
  },
  // Candidates.
  { term: '#', kind: 'column', commands: PARTS, meaning: 'the rank, best first' },
  {
    term: 'candidate',
    kind: 'column',
    commands: PLAN,
    meaning:
      'a clock part by its label, "best in A–B MHz" (the goal\'s best rate of that feasible interval), "centre of the zone n window" when nothing is feasible, or a rate given with --rate',
  },
  {
    term: 'rate',
    kind: 'column',
    commands: PARTS,
    csv: ['rate_hz'],
    meaning: 'the nominal sampling rate, written to 1 Hz (enough to program a part)',
    unit: 'Hz',
  },
  {
    term: 'worst margin',
    kind: 'column',
    commands: PARTS,
    csv: ['worst_margin_hz', 'channel_worst_margin_hz'],
    meaning:
      "the least distance, over the clock's whole tolerance, from any blocking interferer's alias (or a zone edge) to the band's alias; negative: they overlap, by the shift that would clear them",
    unit: 'Hz',
  },
  {
    term: 'limited by',
    kind: 'column',
    commands: PARTS,
    csv: ['limited_by', 'channel_limited_by'],
    meaning:
      'the check with the least margin beyond its requirement: an interferer\'s label, "zone edge" or "rate limit"; "anti-alias mask" when every frequency check passes but the filter falls short of the mask (a stated out-of-band level)',
  },
  {
    term: 'verdict',
    kind: 'column',
    commands: [...PARTS, 'verify'],
    csv: ['pass', 'channel_pass'],
    meaning:
      'pass, or FAIL when a check, a zone edge or a stated anti-alias mask fails somewhere over the tolerance ("FAIL: mask": only the mask)',
  },
  {
    term: 'decimation factor',
    kind: 'column',
    commands: PLAN,
    meaning: 'rate ÷ output rate under the decimation goal; a clock part must give a whole one ("not whole" otherwise)',
  },
  {
    term: 'centre from odd·rate/4',
    kind: 'column',
    commands: PLAN,
    meaning:
      "under the quarter-rate goal, the band's aliased centre minus the nearest odd multiple of rate/4 (0: a trivial digital mixer will do)",
    unit: 'Hz',
  },
  {
    term: 'tolerance',
    kind: 'column',
    commands: PARTS,
    csv: ['tolerance_ppm'],
    meaning: "the clock's drift either way that the verdict holds over",
    unit: 'ppm, per cent above 10 000 ppm',
  },
  {
    term: 'channel',
    kind: 'column',
    commands: [...PARTS, 'verify'],
    csv: ['channels'],
    meaning: 'with a list of channels in the scenario\'s wanted, one channel by its label (CSV: every label, separated by ";")',
  },
  {
    term: 'channel zones',
    kind: 'column',
    commands: PARTS,
    csv: ['channel_zones', 'channel_inverted'],
    meaning:
      'with several channels, the Nyquist zone of each channel by its label, "inv" where it arrives inverted (CSV: one value per channel, separated by ";")',
  },
  {
    term: 'NCO',
    kind: 'column',
    commands: PARTS,
    csv: ['channel_nco_hz'],
    meaning:
      "numerically controlled oscillator of the digital down-converter; in the table, where the band's centre lands after sampling: the frequency to tune it to. Its tuning word is round(f·2^bits / rate), also written in hexadecimal (0x…)",
    unit: 'Hz',
    avoid: ['NCO (centre after sampling)'],
  },
  {
    term: 'settings',
    kind: 'column',
    commands: PARTS,
    csv: ['N', 'M', 'D'],
    meaning: 'how the part makes the rate, rate = f × N / M ÷ D: "direct", "÷D" (a divider), "×N ÷D" or "×N/M ÷D" (a synthesiser)',
  },
  {
    term: 'drift room',
    kind: 'column',
    commands: PARTS,
    csv: ['headroom_down_ppm', 'headroom_up_ppm'],
    meaning: 'how far the nominal rate may move down / up before its first check fails',
    unit: 'ppm, per cent above 10 000 ppm',
    avoid: ['headroom ppm', 'drift headroom column'],
  },
  {
    term: 'jitter SNR dB',
    kind: 'column',
    commands: PARTS,
    csv: ['jitter_snr_db'],
    meaning:
      "the signal-to-noise ratio the clock's jitter (the part's and the converter's aperture jitter together) allows at the band's top edge, −20·log10(2π·f·σ)",
    unit: 'dB',
  },
  {
    term: 'channel SNR dB',
    kind: 'column',
    commands: PARTS,
    csv: ['channel_snr_db'],
    meaning: 'jitter and quantisation noise together, with the processing gain of filtering down to the channel',
    unit: 'dB',
  },
  {
    term: 'filter orders B/C/E',
    kind: 'column',
    commands: ['compare', 'report'],
    csv: ['butterworth_order', 'chebyshev_order', 'elliptic_order'],
    meaning:
      "the least Butterworth / Chebyshev I / elliptic order (low-pass prototype) of an anti-alias filter that meets the mask at the part's rate; none: no filter can",
    avoid: ['filter B/C/E'],
  },
  { term: 'part', kind: 'column', commands: ['compare', 'report'], csv: ['part'], meaning: 'a clock part of the scenario, by its label' },
  {
    term: 'variant',
    kind: 'column',
    commands: ['compare', 'report'],
    csv: ['variant'],
    meaning: 'the scenario (product variant) the row judges the part on',
  },
  {
    term: 'part frequency',
    kind: 'column',
    commands: ['compare'],
    csv: ['frequency_hz'],
    meaning: "the part's own output frequency, before any divider or synthesiser (CSV only)",
    unit: 'Hz',
  },
  { term: 'part jitter', kind: 'column', commands: ['compare'], csv: ['jitter_s'], meaning: "the part's RMS jitter (CSV only)", unit: 's' },
  {
    term: 'passes all',
    kind: 'column',
    commands: ['compare'],
    csv: ['passes_all'],
    meaning: 'true when the part passes on every variant (CSV only)',
  },
  {
    term: 'mask margin',
    kind: 'column',
    commands: ['compare'],
    csv: ['mask_margin_db'],
    meaning: "how far the scenario's filter beats the anti-alias mask at its tightest alias band; negative: short (CSV only)",
    unit: 'dB',
  },
  // The checks of one rate.
  { term: 'check', kind: 'column', commands: [...PLAN, 'verify'], meaning: 'an interferer judged at this rate, by its label' },
  {
    term: 'kind',
    kind: 'column',
    commands: PLAN,
    meaning:
      'harmonic, intermod (a mixing product), spur (on the board), neighbour (a channel or blocker) or converter (rate-tied spurs and interleaving)',
  },
  {
    term: 'input at this rate',
    kind: 'column',
    commands: PLAN,
    meaning: 'where the interferer sits at the converter input at this rate',
    unit: 'Hz',
  },
  { term: 'aliased to', kind: 'column', commands: PLAN, meaning: 'where it shows after sampling, between 0 and rate/2', unit: 'Hz' },
  {
    term: 'margin',
    kind: 'column',
    commands: PLAN,
    meaning: "the least distance over the tolerance between its alias and the band's alias; negative: they overlap",
    unit: 'Hz',
  },
  {
    term: 'level dBFS',
    kind: 'column',
    commands: [...PLAN, 'verify'],
    meaning: 'its level at the converter; "< −200" for anything weaker',
    unit: 'dBFS',
  },
  {
    term: 'level margin dB',
    kind: 'column',
    commands: PLAN,
    meaning: 'the blocking threshold minus its level: 0 or more, too weak to block',
    unit: 'dB',
  },
  {
    term: 'blocks',
    kind: 'column',
    commands: PLAN,
    meaning: 'yes when it is strong enough to count: above the weakest wanted level minus the required rejection',
  },
  // After the rate: the anti-alias mask.
  {
    term: 'alias band (input)',
    kind: 'column',
    commands: PLAN,
    meaning: 'an input range that lands on the channel (widened by the required margin) at this rate and its tolerance',
    unit: 'Hz',
  },
  { term: 'image', kind: 'column', commands: PLAN, meaning: 'which image of the channel it is: k·r ± channel' },
  { term: 'needs dB', kind: 'column', commands: PLAN, meaning: 'the attenuation the anti-alias filter must give over it', unit: 'dB' },
  { term: 'filter gives dB', kind: 'column', commands: PLAN, meaning: "the scenario's filter's least attenuation over it", unit: 'dB' },
  {
    term: 'margin dB',
    kind: 'column',
    commands: PLAN,
    meaning:
      'filter gives minus needs: negative, the filter falls short ("short" where no out-of-band level is stated, "FAIL" where one is)',
    unit: 'dB',
  },
  // The IF shift.
  {
    term: 'pair',
    kind: 'column',
    commands: PLAN,
    meaning: 'the best (IF shift, rate) pair, and for comparison the best rate at the nominal IF',
  },
  { term: 'IF shift', kind: 'column', commands: PLAN, meaning: 'how far the IF moves when the first LO is retuned', unit: 'Hz' },
  { term: 'IF centre', kind: 'column', commands: PLAN, meaning: "the wanted band's centre after the shift", unit: 'Hz' },
  {
    term: 'next margin',
    kind: 'column',
    commands: PLAN,
    meaning: "the next-tightest check's margin beyond its requirement, which ranks pairs that tie on the worst",
    unit: 'Hz',
  },
  // verify: the tones synthesised, the predicted lines, the peaks.
  {
    term: 'tone',
    kind: 'column',
    commands: ['verify'],
    meaning: 'a tone synthesised into the capture: W1, W2 … for the wanted band, else the source it stands for',
  },
  { term: 'role', kind: 'column', commands: ['verify'], meaning: 'wanted, neighbour, board spur or converter' },
  { term: 'asked', kind: 'column', commands: ['verify'], meaning: 'the frequency the plan has for it', unit: 'Hz' },
  {
    term: 'synthesised',
    kind: 'column',
    commands: ['verify'],
    meaning: 'the frequency synthesised: moved to a whole number of cycles of the record',
    unit: 'Hz',
  },
  { term: 'moved', kind: 'column', commands: ['verify'], meaning: 'synthesised minus asked', unit: 'Hz' },
  { term: 'bin', kind: 'column', commands: ['verify'], meaning: 'the FFT bin it lands in (bin width = rate ÷ samples)' },
  {
    term: 'line',
    kind: 'column',
    commands: ['verify'],
    meaning: 'one spectral line the check makes in the capture, e.g. a product of the tones (2·W1, W1 + W2)',
  },
  { term: 'predicted', kind: 'column', commands: ['verify'], meaning: 'where the plan puts the line after sampling', unit: 'Hz' },
  { term: 'measured', kind: 'column', commands: ['verify'], meaning: 'where the capture shows its peak', unit: 'Hz' },
  { term: 'plan dBFS', kind: 'column', commands: ['verify'], meaning: "the plan's level of the check", unit: 'dBFS' },
  { term: 'measured dBFS', kind: 'column', commands: ['verify'], meaning: "the capture's level of the peak", unit: 'dBFS' },
  {
    term: 'result',
    kind: 'column',
    commands: ['verify'],
    meaning:
      'agrees, found (level not judged), crowded, below floor (not looked for); missing, off position, outside plan segments, off level and above plan level contradict the plan',
  },
  { term: 'why', kind: 'column', commands: ['verify'], meaning: 'the reason behind the result' },
  { term: 'predicted bin', kind: 'column', commands: ['verify'], meaning: 'the bin the plan puts the line in (fractional for a band)' },
  { term: 'measured bin', kind: 'column', commands: ['verify'], meaning: "the measured peak's bin" },
  {
    term: 'Δ bins',
    kind: 'column',
    commands: ['verify'],
    meaning: 'measured bin minus predicted bin; more than 1 either way contradicts the plan',
  },
  {
    term: 'level rule',
    kind: 'column',
    commands: ['verify'],
    meaning:
      "how the level is judged: ± the tolerance where the plan's level is the level put there, ≤ + the tolerance where it is a bound",
    unit: 'dB',
  },
  { term: 'model dBFS', kind: 'column', commands: ['verify'], meaning: "the capture's model's own level of the line", unit: 'dBFS' },
  { term: 'Δ dB', kind: 'column', commands: ['verify'], meaning: "measured minus the plan's level", unit: 'dB' },
  { term: 'frequency', kind: 'column', commands: ['verify'], meaning: 'where a measured peak shows after sampling', unit: 'Hz' },
  { term: 'from band', kind: 'column', commands: ['verify'], meaning: 'its distance from the wanted image (0 inside it)', unit: 'Hz' },
  {
    term: 'what the model says',
    kind: 'column',
    commands: ['verify'],
    meaning: "what the capture's model makes of the peak: a product the plan does not list, a line of the plan, or unexplained",
  },
  // Abbreviations and short forms.
  {
    term: 'inv',
    kind: 'abbreviation',
    commands: ['windows', ...PARTS],
    matches: /\binv\b/,
    avoid: ['`inv.`'],
    meaning: 'inverted: the band arrives mirrored (even zones); conjugate the complex output or tune the NCO to the negative frequency',
  },
  {
    term: 'r',
    kind: 'abbreviation',
    commands: PLAN,
    matches: /(?<![\p{L}\p{N}_/])\d*r(?:\/\d+)?(?![\p{L}\p{N}_])/u,
    meaning: 'the sampling rate, in a frequency that moves with it: r/4, 2·r − channel, r − 38–2 MHz',
  },
  {
    term: 'rate/2, rate/4',
    kind: 'abbreviation',
    commands: LABELS,
    matches: /\brate\/\d+\b/,
    meaning: "half and a quarter of the sampling rate: the converter's own spurs there, and the quarter-rate goal's target",
  },
  {
    term: 'fs, fH, B',
    kind: 'abbreviation',
    commands: PLAN,
    matches: /\b(?:fs|fH)\b|·B\b|\bB =/,
    meaning: "in the band-position chart: the sampling rate, the guarded band's upper edge and its width (the guarded width)",
    unit: 'Hz',
  },
  {
    term: 'Hn',
    kind: 'abbreviation',
    commands: LABELS,
    matches: /\bH\d+\b/,
    meaning: 'the nth harmonic of the source named before it ("H2 wanted": the wanted band\'s second harmonic)',
  },
  { term: 'IMn', kind: 'abbreviation', commands: LABELS, matches: /\bIM\d+\b/, meaning: 'a mixing (intermodulation) product of order n' },
  {
    term: 'IL',
    kind: 'abbreviation',
    commands: LABELS,
    matches: /\bIL\b/,
    meaning: 'interleaving: an offset spur at k·r/M or an image k·r/M ± f of an M-core converter ("IL image 1/2−")',
  },
  {
    term: 'Wn, Bn',
    kind: 'abbreviation',
    commands: ['verify'],
    matches: /\b[WB]\d+\b/,
    meaning: "the tones that stand for the wanted band (W1, W2 …) and for another band source (B1 …) in the capture's mixing products",
  },
  {
    term: 'a_k',
    kind: 'abbreviation',
    commands: ['verify'],
    matches: /\ba\d+ =|\ba_k\b/,
    meaning: "the converter polynomial's coefficient of x^k, fitted to the stated harmonic or intercept figure of order k",
  },
  { term: 'DC', kind: 'abbreviation', commands: LABELS, matches: /\bDC\b/, meaning: "direct current, 0 Hz: the converter's offset spur" },
  {
    term: 'IF',
    kind: 'abbreviation',
    commands: PARTS,
    matches: /\bIF\b/,
    meaning: 'intermediate frequency: the band at the converter input, after the first mixer',
  },
  {
    term: 'LO',
    kind: 'abbreviation',
    commands: PARTS,
    matches: /\bLO\b/,
    meaning: "local oscillator: the first mixer's, which sets the IF",
  },
  { term: 'SNR', kind: 'abbreviation', commands: PARTS, matches: /\bSNR\b/, meaning: 'signal-to-noise ratio', unit: 'dB' },
  {
    term: 'B/C/E',
    kind: 'abbreviation',
    commands: ['compare', 'report'],
    matches: /\bB\/C\/E\b/,
    meaning: 'Butterworth / Chebyshev I / elliptic filter orders',
  },
  {
    term: 'Ωs',
    kind: 'abbreviation',
    commands: PLAN,
    matches: /Ωs/,
    meaning: "the filter's selectivity: stopband edge over passband edge of the low-pass prototype, on the tightest side",
  },
  {
    term: 'dBFS',
    kind: 'abbreviation',
    commands: ['solve', 'compare', 'report', 'verify'],
    matches: /\bdBFS\b/,
    meaning: "decibels relative to the converter's full scale (0 dBFS: a full-scale sine); dBFS/Hz per hertz of bandwidth",
  },
  {
    term: 'dBc',
    kind: 'abbreviation',
    commands: PLAN,
    matches: /\bdBc\b/,
    meaning: 'decibels relative to the carrier: a harmonic or image below the signal that makes it',
  },
  {
    term: 'dB',
    kind: 'abbreviation',
    commands: ['solve', 'compare', 'report', 'verify'],
    matches: /\bdB\b/,
    meaning: 'decibels: a ratio of two levels (margins, attenuation, SNR)',
  },
  {
    term: 'ppm',
    kind: 'abbreviation',
    commands: ['windows', ...PARTS],
    matches: /\bppm\b/,
    meaning: 'parts per million of the rate: a clock drift; above 10 000 ppm written in per cent',
  },
  {
    term: '–',
    kind: 'abbreviation',
    commands: ['windows', ...PARTS, 'verify'],
    matches: /(?:^|\s)–(?:\s|$)/,
    meaning: 'does not apply (no figure for this row)',
  },
  {
    term: 'Hz, kHz, MHz, GHz',
    kind: 'abbreviation',
    commands: ['windows', 'alias', ...PARTS, 'verify'],
    matches: /\b[kMG]?Hz\b/,
    meaning: 'hertz, cycles per second, and its thousands, millions and thousand millions',
  },
  {
    term: 'UTC',
    kind: 'abbreviation',
    commands: ['report'],
    matches: /\bUTC\b/,
    meaning: 'coordinated universal time: when the page was made',
  },
  {
    term: 'JSON, CSV',
    kind: 'abbreviation',
    commands: ['windows', 'alias', ...PARTS, 'verify'],
    matches: /\b(?:JSON|CSV)\b/,
    meaning: 'the outputs for programs (--json) and spreadsheets (compare --csv), every number in full precision',
  },
];

/**
 * The glossary entries one command's output uses, in the glossary's order.
 *
 * @param command the command
 * @returns its entries, columns first then abbreviations
 * @example glossaryOf('alias').map((e) => e.term).slice(0, 3) // ['zone', 'inverted', 'frequency']
 */
export function glossaryOf(command: GlossaryCommand): GlossaryEntry[] {
  const mine = GLOSSARY.filter((e) => e.commands.includes(command));
  return [...mine.filter((e) => e.kind === 'column'), ...mine.filter((e) => e.kind === 'abbreviation')];
}

/**
 * The entry that explains a column header as a command draws it: its term,
 * or its pattern for headers that carry a number ("band 2").
 *
 * @param header the header as drawn
 * @param command the command that drew it
 * @returns the entry, or undefined when none explains it
 * @example glossaryEntry('band 2', 'windows')?.term // 'band n'
 */
export function glossaryEntry(header: string, command: GlossaryCommand): GlossaryEntry | undefined {
  return GLOSSARY.find(
    (e) => e.kind === 'column' && e.commands.includes(command) && (e.matches ? e.matches.test(header) : e.term === header),
  );
}
