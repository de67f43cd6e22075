/**
 * The caution carried by everything that shows or exports model results: the app, summary.json,
 * figures and report sheets. One wording, kept here.
 */
export const CAUTION_TEXT =
  'Idealised model results, not a hazard assessment or a water-supply forecast. ' +
  'Decisions about glacier hazards and water resources rest with the local authorities and licensed professional practice.';
