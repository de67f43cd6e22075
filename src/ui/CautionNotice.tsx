import { CAUTION_TEXT } from '../outputs/caution';

/** The caution shown wherever model results are on screen. */

export function CautionNotice() {
  return (
    <p className="caution" role="note">
      <strong>Caution:</strong> {CAUTION_TEXT}
    </p>
  );
}
