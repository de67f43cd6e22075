/** The caution shown wherever model results are on screen. */
export const CAUTION_TEXT =
  'Idealised model results for teaching and exploration, not a hazard assessment. ' +
  'Decisions about glacier hazards rest with the local authorities and licensed professional practice.';

export function CautionNotice() {
  return (
    <p className="caution" role="note">
      <strong>Caution:</strong> {CAUTION_TEXT}
    </p>
  );
}
