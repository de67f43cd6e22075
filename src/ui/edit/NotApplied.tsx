/** Why an edit was refused, next to the field or tool that refused it; nothing when there is none. */
export function NotApplied({ message, id }: { message: string | null | undefined; id?: string }) {
  if (!message) return null;
  return (
    <p id={id} className="field-error" role="alert">
      Not applied: {message}
    </p>
  );
}
