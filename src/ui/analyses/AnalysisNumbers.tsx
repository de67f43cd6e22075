/** An analysis result as label–value rows; `name` marks the list for tests and styling. */
export function AnalysisNumbers({ name, rows }: { name: string; rows: readonly (readonly [string, string])[] }) {
  return (
    <dl className="analysis-numbers" data-numbers={name}>
      {rows.map(([label, value]) => (
        <div key={label} className="number-row">
          <dt>{label}</dt>
          <dd data-number={label}>{value}</dd>
        </div>
      ))}
    </dl>
  );
}
