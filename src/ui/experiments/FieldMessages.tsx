/** Messages for a refused edit ("Not applied: …") or a note that it was applied. */
export function FieldMessages({ errors, note, prefix = 'Not applied: ' }: { errors: readonly string[]; note?: string | null; prefix?: string }) {
  return (
    <>
      {errors.length > 0 && (
        <div className="field-error" role="alert">
          {errors.map((line, k) => (
            <p key={k}>{k === 0 ? `${prefix}${line}` : line}</p>
          ))}
        </div>
      )}
      {errors.length === 0 && note && (
        <p className="experiment-note" role="status">
          {note}
        </p>
      )}
    </>
  );
}
