/**
 * ifzone as a library: `import { planScenario, readScenarioFile } from 'ifzone'`.
 * Everything here is pure (numbers and objects in, numbers and objects out)
 * except readScenarioFile, which reads the file and its `extends` chain.
 * Frequencies are hertz, levels dB, tolerances ppm, as branded numbers
 * (`hz(70e6)`); the result objects are the JSON the commands print.
 */

// Scenarios: read a file, or validate a document already in memory.
export { readScenarioFile } from './cli/read-scenario.js';
export { resolveScenario, scenarioFromDocument } from './scenario/resolve-scenario.js';
export { ScenarioError, type ScenarioIssue } from './scenario/scenario-issue.js';
export { scenarioJsonSchema } from './scenario/scenario-json-schema.js';
export type { Scenario, ClockPart, Converter, Goal } from './scenario/scenario.js';

// The plan of a scenario, of a family of variants, and at one rate.
export { planScenario, planAtRate, type PlanOptions } from './plan/plan-scenario.js';
export { compareFamily, planFamily, type FamilyPlan, type FamilyVariant } from './plan/plan-family.js';
export type { PlanReport, ReportedCandidate, ReportedCheck, ReportedFeasible } from './plan/plan-report.js';
export type { ShiftReport, ReportedShift } from './plan/shift-report.js';
export type { CompareReport, ComparedPart, VariantVerdict } from './plan/compare-report.js';
export type { RateEvaluation, CheckResult } from './solve/evaluate-rate.js';
export { PAPER_DESIGN_CAUTION } from './plan/caution.js';

// The pieces: windows, folding, drift.
export { rateWindows, guardedBand, lowestLegalRate } from './windows/enumerate-windows.js';
export type { RateWindow, RateLimits } from './windows/rate-window.js';
export { commonWindows, type CommonWindow } from './windows/common-windows.js';
export { jointFeasibleSet, type JointFeasibleSet, type JointInterval, type BandCollision } from './solve/joint-feasible-set.js';
export { foldFrequency, nyquistZone, lookalikes, type Fold } from './math/fold.js';
export { bandImage, wantedZone, guardBands, type Band, type BandImage, type Guard } from './math/band.js';
export { foldExtent } from './math/fold-extent.js';
export { driftRange } from './solve/drift.js';

// The other commands' results.
export { windowsReport, type WindowsReport } from './report/windows-report.js';
export { jointWindowsReport, type JointWindowsReport } from './report/joint-windows-report.js';
export { aliasReport, type AliasReport } from './report/alias-report.js';
export { verifyCapture, type CaptureSettings } from './report/verify-capture.js';
export type { VerifyResult } from './report/verify-result.js';

// Writers: the same text the commands print.
export { toJson } from './output/json.js';
export { planTable } from './output/plan-table.js';
export { compareTable, compareCsv } from './output/compare-table.js';
export { reviewPage } from './output/html-report.js';

// Units.
export { hz, db, ppm, seconds, type Hz, type Db, type Ppm, type Seconds } from './units/quantities.js';
export { parseFrequency } from './units/parse-frequency.js';
export { formatFrequency } from './units/format-frequency.js';
export { quantityText, settingsText, type Medium, type QuantityText } from './text/quantity-text.js';
export { InputError } from './units/input-error.js';
