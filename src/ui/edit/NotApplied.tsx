/**
 * Why an edit was refused, next to the field or tool that refused it; nothing when there is none.
 * While a refusal is shown the steady-glacier preview shows nothing (it is of the document, which
 * the refused edit did not change, not of what was typed), so each one is registered there.
 */
import { useEffect, useId } from 'react';
import { useSteadyPreviewStore } from '../../state/steadyPreviewStore';

export function NotApplied({ message, id }: { message: string | null | undefined; id?: string }) {
  const field = useId();
  useEffect(() => {
    const { refuse, clearRefusal } = useSteadyPreviewStore.getState();
    if (!message) {
      clearRefusal(field);
      return;
    }
    refuse(field, message);
    return () => clearRefusal(field);
  }, [field, message]);
  if (!message) return null;
  return (
    <p id={id} className="field-error" role="alert">
      Not applied: {message}
    </p>
  );
}
