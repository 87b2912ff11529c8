import { mkdtempSync, readFileSync } from 'node:fs';
import { Command } from 'commander';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import * as api from '../../src/index.js';
import { readScenarioFile } from '../../src/cli/read-scenario.js';
import { planScenario } from '../../src/plan/plan-scenario.js';
import { contextFromScenario } from '../../src/solve/context-from-scenario.js';
import { planRates } from '../../src/solve/feasible-set.js';
import { handWorkedContext } from '../helpers/hand-worked-plan.js';
import { scenarioFixture } from '../helpers/scenario-fixture.js';
import { captureTones } from '../../src/capture/capture-tones.js';
import { inputIndex } from '../../src/capture/family-lines.js';
import { hz } from '../../src/units/quantities.js';
import { verifyCaptureWithSpectrum } from '../../src/report/verify-capture.js';
import { twoChannelReport } from '../helpers/channel-report.js';

/**
 * The names a doc example may use besides its own module's exports: the
 * public API, and fixtures named in the examples (the demo scenarios, the
 * plan worked on paper in test/solve/hand-worked.test.ts, the test fixture
 * scenario `s`, a hand-made report of two channels, the best candidate of the demo, its capture tones, a
 * capturing `io`, a temporary directory).
 */
export async function exampleScope(): Promise<Record<string, unknown>> {
  const root = fileURLToPath(new URL('../../', import.meta.url));
  const scenario = (name: string) => readScenarioFile(join(root, 'scenarios', `${name}.json`));
  const heronBase = scenario('heron-base');
  const heronNarrow = scenario('heron-narrow');
  const handWorked = handWorkedContext();
  const written: string[] = [];
  const report = planScenario(heronBase);
  const record = { rate: hz(184.32e6), samples: 65536, wantedTones: 1 };
  const tones = captureTones(heronBase, record, { wanted: [], neighbours: [] });
  return {
    ...api,
    heronBase,
    heronBaseDocument: JSON.parse(readFileSync(join(root, 'scenarios', 'heron-base.json'), 'utf8')) as Record<
      string,
      Record<string, unknown>
    >,
    heronNarrow,
    heronLowIf: scenario('heron-lowif'),
    heronWide: scenario('heron-wide'),
    report,
    candidate: report.candidates[0],
    after: report.candidates[0]!.afterRate,
    tones,
    index: inputIndex(tones),
    captureInterferers: contextFromScenario(heronBase).interferers,
    verified: verifyCaptureWithSpectrum(heronBase, { rate: hz(184.32e6), samples: 4096, wantedTones: 1 }),
    readFileSync,
    join,
    Command,
    narrowReport: planScenario(heronNarrow),
    handWorked,
    twoChannels: twoChannelReport(),
    handWorkedSet: planRates(handWorked),
    blocking: handWorked.interferers.filter((i) => i.blocking),
    s: scenarioFixture(),
    sContext: contextFromScenario(scenarioFixture()),
    io: { out: (text: string) => written.push(text), err: (text: string) => written.push(text) },
    written,
    tmp: mkdtempSync(join(tmpdir(), 'ifzone-examples-')),
    root,
  };
}
