/** The caution every report carries, in the words people and programs both see. */
export const PAPER_DESIGN_CAUTION =
  'A frequency plan is a paper design: confirm it by measurement on hardware. ' +
  'It does not show compliance with radio regulations or emission limits; defer to the applicable rules and accredited testing.';
