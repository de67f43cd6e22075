/**
 * The caution carried by everything that shows or exports model results: the app, summary.json,
 * figures and report sheets. One wording, kept here.
 */
export const CAUTION_TEXT =
  'Idealised model results, not a hazard assessment or a water-supply forecast. ' +
  'Decisions about glacier hazards and water resources rest with the local authorities and licensed professional practice.';

/**
 * Shown (and written to lakes.json) whenever a lake in an exposed overdeepening is reported:
 * such lakes are a hazard precursor, and the geometry here is no assessment of one.
 */
export const LAKE_CAUTION_TEXT =
  'Lakes in exposed overdeepenings (basins the ice has left) are a hazard precursor (for example of outburst floods); ' +
  'the lakes shown are bed geometry only, with no water budget, dam or breach. ' +
  CAUTION_TEXT;
