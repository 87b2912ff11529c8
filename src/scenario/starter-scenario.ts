/**
 * The documents `ifzone init` writes: a starter scenario whose every field
 * holds a placeholder to replace, and a variant that extends an existing
 * file. Pure: paths are passed in already made relative.
 */

/**
 * A complete starter scenario that validates as it stands, so that a new
 * variant can be solved at once and edited field by field.
 *
 * @param schemaPath the `$schema` reference, relative to where the file goes
 */
export function starterScenario(schemaPath: string): Record<string, unknown> {
  return {
    $schema: schemaPath,
    name: 'New receiver variant',
    description: "Replace every value below with the variant's own: IF band, converter, board spurs, neighbours, filter, clock parts.",
    wanted: { center: '70M', width: '10M', weakestLevel: -70, strongestLevel: -1 },
    guard: '10%',
    converter: {
      label: 'converter part number',
      minRate: '20M',
      maxRate: '125M',
      inputBandwidth: '500M',
      bits: 12,
      harmonics: { '2': -75, '3': -80, '4': -85, '5': -88 },
      rateSpurs: { dc: -70, halfRate: -85 },
      apertureJitter: '100 fs',
      clockDividers: [1],
    },
    harmonicOrder: 5,
    boardSpurs: [{ label: 'reference clock', frequency: '10M', level: -85, harmonics: 5 }],
    neighbours: [{ label: 'adjacent channel', center: '82M', width: '10M', level: -30 }],
    filter: { kind: 'butterworth', order: 5, passLow: '64M', passHigh: '76M' },
    requirements: { margin: '500k', rejection: 10, tolerancePpm: 50 },
    clocks: [{ label: 'oscillator part number', frequency: '92.16M', tolerance: 20, jitter: '150 fs' }],
    goal: 'widest-margin',
  };
}

/**
 * A variant that extends a base scenario and overrides nothing yet.
 *
 * @param schemaPath the `$schema` reference, relative to where the file goes
 * @param basePath the base file, relative to where the file goes
 * @param baseName the base scenario's name
 */
export function variantScenario(schemaPath: string, basePath: string, baseName: string): Record<string, unknown> {
  return {
    $schema: schemaPath,
    extends: basePath,
    name: `${baseName} variant`,
    description: `What this variant changes from ${baseName}; add only the fields that differ.`,
  };
}
