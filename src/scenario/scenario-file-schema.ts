import { z } from 'zod';
import { formatFrequency } from '../units/format-frequency.js';
import { hz } from '../units/quantities.js';
import type { Scenario } from './scenario.js';
import { refuseAt } from './band-forms.js';
import { converterSchema } from './converter-schema.js';
import { filterSchema } from './filter-schema.js';
import { goalSchema, guardSchema, requirementsSchema, wantedSchema } from './plan-schema.js';
import { guardHz, wholeNumber } from './scenario-fields.js';
import { boardSpurSchema, clockSchema, neighbourSchema } from './signals-schema.js';

/**
 * The scenario file format, defined once: zod validates a parsed JSON
 * document with it, `z.input` gives the file's TypeScript type, and
 * `z.toJSONSchema` the schema printed by `ifzone schema`. Its output is the
 * validated `Scenario` (all Hz, defaults filled). Checks that span sections
 * (the wanted band against the converter, unique labels) run last.
 *
 * `extends` is read by resolve-scenario.ts before validation; it is listed
 * here so editors accept it.
 */
export const scenarioFileSchema = z
  .strictObject({
    $schema: z.string().optional().meta({ description: 'Where editors find this schema, e.g. "./ifzone-scenario.schema.json"' }),
    extends: z.string().optional().meta({ description: 'A base scenario file, relative to this one; objects merge key by key, lists replace' }),
    name: z.string().regex(/\S/, { error: 'a name that is not blank' }).meta({ description: 'Variant name, e.g. "Heron-4 base"' }),
    description: z.string().default('').meta({ description: 'What this variant is, for people' }),
    wanted: wantedSchema,
    guard: guardSchema.prefault(0),
    converter: converterSchema,
    harmonicOrder: wholeNumber(2, 15, 'Highest harmonic order of the wanted band checked (default 5)').default(5),
    boardSpurs: z.array(boardSpurSchema).meta({ description: 'Fixed tones and bands from the board' }).prefault([]),
    neighbours: z.array(neighbourSchema).meta({ description: 'Neighbour channels and blockers' }).prefault([]),
    filter: filterSchema.nullable().prefault(null),
    requirements: requirementsSchema,
    clocks: z.array(clockSchema).meta({ description: 'Candidate sample clocks' }).prefault([]),
    goal: goalSchema.prefault('widest-margin'),
  })
  .meta({
    $id: 'https://ifzone.invalid/ifzone-scenario.schema.json',
    title: 'ifzone scenario',
    description: 'One receiver variant for the ifzone band-pass sampling frequency planner',
  })
  .transform((file, ctx): Scenario => {
    const { wanted, converter } = file;
    if (wanted.high > converter.inputBandwidth) {
      refuseAt(
        ctx,
        ['wanted', 'high'],
        `a wanted band at or below the converter's input bandwidth (converter.inputBandwidth ${formatFrequency(converter.inputBandwidth)})`,
        `wanted band up to ${formatFrequency(wanted.high)}`,
        [['converter', 'inputBandwidth']],
      );
    }
    refuseRepeatedLabels(ctx, [
      ['boardSpurs', file.boardSpurs],
      ['neighbours', file.neighbours],
      ['clocks', file.clocks],
    ]);
    const width = hz(wanted.high - wanted.low);
    return {
      name: file.name,
      description: file.description,
      wanted,
      guard: { low: guardHz(file.guard.low, width), high: guardHz(file.guard.high, width) },
      converter,
      harmonicOrder: file.harmonicOrder,
      boardSpurs: file.boardSpurs,
      neighbours: file.neighbours,
      filter: file.filter,
      requirements: file.requirements,
      clocks: file.clocks,
      goal: file.goal,
    };
  });

/** The scenario file as written, for programs that write scenario files. */
export type ScenarioFile = z.input<typeof scenarioFileSchema>;

/** Compile-time proof that the schema's output is exactly the `Scenario` model. */
type Same<A, B> = (<T>() => T extends A ? 1 : 2) extends <T>() => T extends B ? 1 : 2 ? true : false;
const outputIsScenario: Same<z.output<typeof scenarioFileSchema>, Scenario> = true;
void outputIsScenario;

function refuseRepeatedLabels(ctx: z.RefinementCtx, lists: ReadonlyArray<readonly [string, ReadonlyArray<{ readonly label: string }>]>): void {
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
