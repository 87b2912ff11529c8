import { guardBands } from '../math/band.js';
import './zod-config.js';
import * as z from 'zod';
import { formatFrequency } from '../units/format-frequency.js';
import { hz, type Hz } from '../units/quantities.js';
import type { Band } from '../math/band.js';
import type { Channel, Requirements, Scenario, WantedBand } from './scenario.js';
import { refuseAt } from './band-forms.js';
import { converterSchema } from './converter-schema.js';
import { filterSchema } from './filter-schema.js';
import { goalSchema, guardSchema, requirementsSchema, wantedOrChannelsSchema, type ChannelDraft, type GuardSides } from './plan-schema.js';
import { guardHz, wholeNumber } from './scenario-fields.js';
import { boardSpurSchema, neighbourSchema } from './signals-schema.js';
import { clockPartSchema } from './clock-part-schema.js';
import { ifShiftSchema } from './if-shift-schema.js';
import { afterRateFileFields, afterRateSettings } from './after-rate-schema.js';
import { maxOrderSchema } from './interferer-model-schema.js';
import { refuseTooMuchWork } from './work-bounds.js';

/** Most board spurs in a scenario: each brings up to 20 harmonics, and the simulated capture synthesises every one. */
export const MOST_BOARD_SPURS = 64;
/**
 * Most neighbours: their products grow as a power of their number; candidates
 * are judged on the blocking ones only, and `npm run bench` keeps 200 within
 * its time and memory targets.
 */
export const MOST_NEIGHBOURS = 256;
/** Most clock parts: each is planned on every feasible interval (`npm run bench` plans 1,000). */
export const MOST_CLOCKS = 1024;

/**
 * The scenario file format, defined once: zod validates a parsed JSON
 * document with it, `z.input` gives the file's TypeScript type, and
 * `z.toJSONSchema` the schema printed by `ifzone schema`. Its output is the
 * validated `Scenario` (all Hz, defaults filled). Checks that span sections
 * (the wanted band, shifted as far as ifShift allows, against the converter;
 * unique labels) run last.
 *
 * `extends` is read by resolve-scenario.ts before validation; it is listed
 * here so editors accept it.
 */
export const scenarioFileSchema = z
  .strictObject({
    $schema: z.string().optional().meta({ description: 'Where editors find this schema, e.g. "./ifzone-scenario.schema.json"' }),
    extends: z
      .string()
      .optional()
      .meta({ description: 'A base scenario file, relative to this one; objects merge key by key, lists replace' }),
    name: z.string().regex(/\S/, { error: 'a name that is not blank' }).meta({ description: 'Variant name, e.g. "Heron-4 base"' }),
    description: z.string().default('').meta({ description: 'What this variant is, for people' }),
    wanted: wantedOrChannelsSchema.meta({
      description: 'The wanted IF band; or a list of channels digitised together, each with a label (see the README)',
    }),
    guard: guardSchema.prefault(0),
    converter: converterSchema,
    harmonicOrder: wholeNumber(2, 15, 'Highest harmonic order checked of each signal at the converter input (default 5)').default(5),
    maxOrder: maxOrderSchema,
    boardSpurs: z
      .array(boardSpurSchema)
      .max(MOST_BOARD_SPURS, { error: `a list of at most ${MOST_BOARD_SPURS} board spurs` })
      .meta({ description: `Fixed tones and bands from the board (at most ${MOST_BOARD_SPURS})` })
      .prefault([]),
    neighbours: z
      .array(neighbourSchema)
      .max(MOST_NEIGHBOURS, { error: `a list of at most ${MOST_NEIGHBOURS} neighbours (their third-order products grow as the cube)` })
      .meta({ description: `Neighbour channels and blockers (at most ${MOST_NEIGHBOURS})` })
      .prefault([]),
    filter: filterSchema.nullable().prefault(null),
    requirements: requirementsSchema,
    clocks: z
      .array(clockPartSchema)
      .max(MOST_CLOCKS, { error: `a list of at most ${MOST_CLOCKS} clock parts` })
      .meta({ description: `Candidate clock parts: crystals, oscillators, synthesiser references (at most ${MOST_CLOCKS})` })
      .prefault([]),
    goal: goalSchema.prefault('widest-margin'),
    ifShift: ifShiftSchema.nullable().prefault(null),
    ...afterRateFileFields,
  })
  .meta({
    $id: 'https://ifzone.invalid/ifzone-scenario.schema.json',
    title: 'ifzone scenario',
    description: 'One receiver variant for the ifzone band-pass sampling frequency planner',
  })
  .transform((file, ctx): Scenario => {
    const { converter } = file;
    const listed = Array.isArray(file.wanted);
    const channels = listed ? (file.wanted as ChannelDraft[]).map((draft) => channelOf(draft, file.guard, file.requirements)) : [];
    const wanted: WantedBand = listed ? bandOnly(channels[0]!) : (file.wanted as WantedBand);
    if (listed) channels.forEach((channel, i) => refuseChannelOutside(ctx, channel, i, converter.inputBandwidth, file.filter));
    else if (wanted.high > converter.inputBandwidth) {
      refuseAt(
        ctx,
        ['wanted', 'high'],
        `a wanted band at or below the converter's input bandwidth (converter.inputBandwidth ${formatFrequency(converter.inputBandwidth)})`,
        `wanted band up to ${formatFrequency(wanted.high)}`,
        [['converter', 'inputBandwidth']],
      );
    }
    if (file.ifShift && listed) {
      refuseAt(
        ctx,
        ['ifShift'],
        'no IF shift with a list of channels (the shift search plans one wanted band; give wanted as one object to use it)',
        'an IF shift',
        [['wanted']],
      );
    }
    if (file.ifShift && !listed) refuseShiftOutside(ctx, wanted, file.ifShift, converter.inputBandwidth);
    refuseRepeatedLabels(ctx, [
      ['wanted', channels],
      ['boardSpurs', file.boardSpurs],
      ['neighbours', file.neighbours],
      ['clocks', file.clocks],
    ]);
    const width = hz(wanted.high - wanted.low);
    const guard = listed ? channels[0]!.guard : guardBands(guardHz(file.guard.low, width), guardHz(file.guard.high, width));
    const requirements = listed ? channels[0]!.requirements : file.requirements;
    for (const channel of listed ? channels : [{ ...wanted, guard, requirements }])
      refuseTooMuchWork(ctx, { ...file, wanted: channel, guard: channel.guard, requirements: channel.requirements });
    return {
      name: file.name,
      description: file.description,
      wanted,
      channels: listed ? channels : [{ label: 'wanted', ...wanted, guard, requirements }],
      guard,
      converter,
      harmonicOrder: file.harmonicOrder,
      maxOrder: file.maxOrder,
      boardSpurs: file.boardSpurs,
      neighbours: file.neighbours,
      filter: file.filter,
      requirements,
      clocks: file.clocks,
      goal: file.goal,
      ifShift: file.ifShift,
      afterRate: afterRateSettings(file),
    };
  });

/** The scenario file as written, for programs that write scenario files. */
export type ScenarioFile = z.input<typeof scenarioFileSchema>;

/** Compile-time proof that the schema's output is exactly the `Scenario` model. */
type Same<A, B> = (<T>() => T extends A ? 1 : 2) extends <T>() => T extends B ? 1 : 2 ? true : false;
const outputIsScenario: Same<z.output<typeof scenarioFileSchema>, Scenario> = true;
void outputIsScenario;

/** A channel of a list resolved: its guard (percentages of its own width) and its requirements over the scenario's. */
function channelOf(draft: ChannelDraft, scenarioGuard: GuardSides, scenarioRequirements: Requirements): Channel {
  const width = hz(draft.high - draft.low);
  const sides = draft.guard ?? scenarioGuard;
  return {
    label: draft.label,
    ...bandOnly(draft),
    guard: guardBands(guardHz(sides.low, width), guardHz(sides.high, width)),
    requirements: { ...scenarioRequirements, ...draft.requirements },
  };
}

/** The band and levels of a channel alone. */
function bandOnly(channel: WantedBand): WantedBand {
  return { low: channel.low, high: channel.high, weakestLevel: channel.weakestLevel, strongestLevel: channel.strongestLevel };
}

/** Each channel of a list must lie inside the converter's input bandwidth and a Butterworth filter's pass band. */
function refuseChannelOutside(ctx: z.RefinementCtx, channel: Channel, index: number, inputBandwidth: Hz, filter: Scenario['filter']): void {
  const name = `wanted[${index}] (${JSON.stringify(channel.label)})`;
  if (channel.high > inputBandwidth) {
    refuseAt(
      ctx,
      ['wanted', index, 'high'],
      `a channel at or below the converter's input bandwidth (converter.inputBandwidth ${formatFrequency(inputBandwidth)})`,
      `${name} up to ${formatFrequency(channel.high)}`,
      [['converter', 'inputBandwidth']],
    );
  }
  if (filter?.kind !== 'butterworth') return;
  if (channel.low < filter.passLow) {
    refuseAt(
      ctx,
      ['wanted', index, 'low'],
      `a channel inside the filter's pass band (filter.passLow ${formatFrequency(filter.passLow)})`,
      `${name} from ${formatFrequency(channel.low)}`,
      [['filter', 'passLow']],
    );
  }
  if (channel.high > filter.passHigh) {
    refuseAt(
      ctx,
      ['wanted', index, 'high'],
      `a channel inside the filter's pass band (filter.passHigh ${formatFrequency(filter.passHigh)})`,
      `${name} up to ${formatFrequency(channel.high)}`,
      [['filter', 'passHigh']],
    );
  }
}

function refuseRepeatedLabels(
  ctx: z.RefinementCtx,
  lists: ReadonlyArray<readonly [string, ReadonlyArray<{ readonly label: string }>]>,
): void {
  const firstUse = new Map<string, { text: string; path: (string | number)[] }>();
  for (const [list, items] of lists) {
    items.forEach((item, i) => {
      const here = `${list}[${i}].label`;
      const earlier = firstUse.get(item.label);
      if (earlier === undefined) firstUse.set(item.label, { text: here, path: [list, i, 'label'] });
      else {
        const words = `a label not used elsewhere (${earlier.text} is already ${JSON.stringify(item.label)})`;
        refuseAt(ctx, [list, i, 'label'], words, JSON.stringify(item.label), [earlier.path]);
      }
    });
  }
}

/** The wanted band moved by either end of the shift must stay above 0 Hz and within the converter's input bandwidth. */
function refuseShiftOutside(ctx: z.RefinementCtx, wanted: Band, shift: { readonly low: Hz; readonly high: Hz }, inputBandwidth: Hz): void {
  if (wanted.low + shift.low < 0) {
    refuseAt(
      ctx,
      ['ifShift', 'low'],
      `a shift that keeps the wanted band at or above 0 Hz (at least ${formatFrequency(-wanted.low)})`,
      formatFrequency(shift.low),
      [['wanted']],
    );
  }
  if (wanted.high + shift.high > inputBandwidth) {
    refuseAt(
      ctx,
      ['ifShift', 'high'],
      `a shift that keeps the wanted band within the converter's input bandwidth (converter.inputBandwidth ${formatFrequency(inputBandwidth)}; at most ${formatFrequency(inputBandwidth - wanted.high)})`,
      formatFrequency(shift.high),
      [['wanted'], ['converter', 'inputBandwidth']],
    );
  }
}
