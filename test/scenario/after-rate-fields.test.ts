import { describe, expect, it } from 'vitest';
import { scenarioFromDocument } from '../../src/scenario/resolve-scenario.js';
import { scenarioJsonSchema } from '../../src/scenario/scenario-json-schema.js';
import { ScenarioError } from '../../src/scenario/scenario-issue.js';
import { jsonSchemaAccepts } from './json-schema-check.js';

/** The optional after-rate fields of the file format: the filter mask, the driver's noise, the down-converter. */
const base = {
  name: 'Heron-AR',
  wanted: { low: '65M', high: '75M', weakestLevel: -60 },
  converter: { label: 'c', minRate: '20M', maxRate: '250M', inputBandwidth: '500M', bits: 14, harmonics: {} },
  requirements: { margin: '1M', rejection: 20 },
};

const load = (fields: object) => scenarioFromDocument({ ...base, ...fields }, 'after-rate.json');
const refusal = (fields: object): string => {
  try {
    load(fields);
  } catch (error) {
    if (error instanceof ScenarioError) return error.issues.map((i) => `${i.path}: ${i.expected}`).join('; ');
    throw error;
  }
  return 'accepted';
};

describe('after-rate fields of the scenario file', () => {
  it('default so that a file without them loads as before: no level, 1 dB ripple, no density, no NCO, no output rate, 80 %', () => {
    expect(load({}).afterRate).toEqual({
      outOfBandLevel: null,
      passbandRipple: 1,
      driverNoiseDensity: null,
      downConverter: { ncoBits: null, outputRate: null, usableFraction: 0.8 },
    });
    expect(jsonSchemaAccepts(scenarioJsonSchema(), base)).toBe(true);
  });

  it('read as written, frequencies with prefixes', () => {
    const fields = {
      filterMask: { outOfBandLevel: -25, passbandRipple: 0.5 },
      driverNoiseDensity: -155,
      downConverter: { ncoBits: 32, outputRate: '30.72M', usableFraction: 0.75 },
    };
    expect(load(fields).afterRate).toEqual({
      outOfBandLevel: -25,
      passbandRipple: 0.5,
      driverNoiseDensity: -155,
      downConverter: { ncoBits: 32, outputRate: 30.72e6, usableFraction: 0.75 },
    });
    expect(jsonSchemaAccepts(scenarioJsonSchema(), { ...base, ...fields })).toBe(true);
  });

  it.each([
    [{ filterMask: { outOfBandLevel: 150 } }, 'filterMask.outOfBandLevel'],
    [{ filterMask: { passbandRipple: 25 } }, 'filterMask.passbandRipple'],
    [{ filterMask: { passbandRipple: 0 } }, 'filterMask.passbandRipple'],
    [{ downConverter: { ncoBits: 64 } }, 'downConverter.ncoBits'],
    [{ downConverter: { usableFraction: 1.2 } }, 'downConverter.usableFraction'],
    [{ downConverter: { ncoBit: 32 } }, 'downConverter'],
  ])('refuses %j at its path, in the loader and in the JSON Schema', (fields, path) => {
    expect(refusal(fields)).toContain(path);
    expect(jsonSchemaAccepts(scenarioJsonSchema(), { ...base, ...fields })).toBe(false);
  });

  it('refuses an output rate of 0 Hz in the loader (the JSON Schema states frequencies as text or numbers only)', () => {
    expect(refusal({ downConverter: { outputRate: 0 } })).toContain('downConverter.outputRate');
  });
});
