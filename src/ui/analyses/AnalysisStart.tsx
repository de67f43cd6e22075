/** Why the typed inputs were refused (if they were), the start button, and the analysis' status. */
import type { ReactNode } from 'react';
import type { AnalysisKind } from '../../worker/analysisProtocol';
import { AnalysisStatus } from './AnalysisStatus';

export function AnalysisStart({ kind, error, disabled, onStart, children }: { kind: AnalysisKind; error: string | null; disabled: boolean; onStart: () => void; children: ReactNode }) {
  return (
    <>
      {error && (
        <p className="field-error" role="alert">
          {error}
        </p>
      )}
      <div className="button-row">
        <button type="button" className="primary" disabled={disabled} onClick={onStart}>
          {children}
        </button>
      </div>
      <AnalysisStatus kind={kind} />
    </>
  );
}
