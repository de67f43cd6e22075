/**
 * The bed from the surface: the scenario's observed surface and terminus inverted for the bed in
 * the analysis worker (model/analysis/bedFromSurface.ts), with the rate factor fitted to the
 * radar thickness points when asked. The result is previewed on the long profile (a dashed line
 * and the band of the rate factor's range) and can be applied as one undoable edit through
 * commitEdit, or discarded.
 */
import { useState } from 'react';
import { DEFAULT_SMOOTHING_METRES, SMOOTHING_RANGE_METRES } from '../../model/analysis/bedFromSurface';
import { invertedScenario } from '../../model/inversion/invertBed';
import { validateInversionInput } from '../../scenario/validateInversionInput';
import { formatMessage } from '../../scenario/validateScenario';
import { useAnalysisStore, type ResultOf } from '../../state/analysisStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { CautionNotice } from '../CautionNotice';
import { commitEdit } from '../edit/commitEdit';
import { LocalNumberInput } from '../edit/LocalNumberInput';
import { formatKm } from '../results/formatResult';
import { useAnalysisClient } from './AnalysisClientContext';
import { AnalysisNumbers } from './AnalysisNumbers';
import { AnalysisStart } from './AnalysisStart';
import { checkSmoothing } from './analysisInputs';

/** What the inversion needs and the scenario lacks, in words; null when it has both. */
export function missingForInversion(scenario: { surface?: unknown; observations?: { terminus?: unknown } }): string | null {
  const missing = [
    ...(scenario.surface === undefined ? ['the observed ice surface (editor, Geometry tab: the initial surface)'] : []),
    ...(scenario.observations?.terminus === undefined ? ['the observed terminus (editor, Observations tab)'] : []),
  ];
  if (missing.length === 0) return null;
  return missing.length === 2
    ? `The bed from the surface needs ${missing.join(' and ')}; this scenario has neither.`
    : `The bed from the surface needs ${missing[0]}, which this scenario does not have.`;
}

export function InversionSection() {
  const client = useAnalysisClient();
  const busy = useAnalysisStore((s) => s.active !== null);
  const slot = useAnalysisStore((s) => s.inversion);
  const scenario = useScenarioStore((s) => s.scenario);
  const radarPoints = scenario.observations?.thickness?.length ?? 0;
  const [smoothingText, setSmoothingText] = useState(String(DEFAULT_SMOOTHING_METRES));
  const [fit, setFit] = useState(true);
  const [error, setError] = useState<string | null>(null);
  const missing = missingForInversion(scenario);

  const start = () => {
    const { scenario: current, revision } = useScenarioStore.getState();
    const lacking = missingForInversion(current);
    if (lacking) return setError(lacking);
    const smoothing = checkSmoothing(smoothingText, SMOOTHING_RANGE_METRES);
    if (!smoothing.ok) return setError(smoothing.message);
    const input = validateInversionInput(current);
    if (!input.ok) return setError(`The surface and terminus cannot be inverted: ${input.errors.map(formatMessage).join('; ')}`);
    setError(null);
    client.start({ kind: 'inversion', scenario: current, smoothingMetres: smoothing.value, fitRateFactor: fit && radarPoints > 0 }, revision);
  };

  return (
    <div className="analysis" data-analysis="inversion">
      <p className="analysis-intro">
        Work out the bed under the scenario&apos;s ice surface from mass conservation and the model&apos;s flow law, ending at the observed terminus. The
        result is previewed on the long profile; nothing changes until you apply it.
      </p>
      {missing && (
        <p className="notice" role="status" data-missing="inversion">
          {missing}
        </p>
      )}
      <div className="analysis-fields">
        <LocalNumberInput label="Smoothing distance" unit="m" value={smoothingText} onChange={setSmoothingText} />
      </div>
      <label className="analysis-check">
        <input type="checkbox" checked={fit && radarPoints > 0} disabled={radarPoints === 0} onChange={(e) => setFit(e.target.checked)} /> Fit the rate factor A to the{' '}
        {radarPoints} measured thickness point{radarPoints === 1 ? '' : 's'}
      </label>
      <p className="field-help">
        Smoothing: a running mean over the surface before its slope is taken, {SMOOTHING_RANGE_METRES[0]} to {SMOOTHING_RANGE_METRES[1].toLocaleString('en')} m (default{' '}
        {DEFAULT_SMOOTHING_METRES} m; never less than three grid cells, {3 * scenario.grid.spacing} m here).
        {radarPoints === 0 ? ' Without measured thickness points A is not fitted; the band is the bed for A / 2 to 2 A.' : ''}
      </p>
      <AnalysisStart kind="inversion" error={error} disabled={busy} onStart={start}>
        Compute the bed from the surface
      </AnalysisStart>
      {slot.result && <InversionResultView result={slot.result} madeAt={slot.revision} />}
    </div>
  );
}

const metres = (v: number) => `${Math.round(v).toLocaleString('en')} m`.replace('-', '\u2212');

function InversionResultView({ result, madeAt }: { result: ResultOf<'inversion'>; madeAt: number | null }) {
  const revision = useScenarioStore((s) => s.revision);
  const previewShown = useAnalysisStore((s) => s.inversionPreview);
  const [applied, setApplied] = useState<{ text: string; ok: boolean } | null>(null);
  const { inversion: r, fitted, smoothingMetres } = result.bed;
  const current = madeAt === revision;
  let maxThickness = 0;
  for (const h of r.thickness) maxThickness = Math.max(maxThickness, h);

  const apply = () => {
    // Made from this revision, so the inversion's scenario is the current one.
    const { scenario } = useScenarioStore.getState();
    const done = commitEdit(invertedScenario(scenario, r), `Bed from the surface (smoothing ${smoothingMetres} m${fitted ? ', A fitted' : ''})`);
    if (done.ok) useAnalysisStore.getState().setInversionPreview(false);
    setApplied(
      done.ok
        ? { ok: true, text: 'Applied: the bed from the surface is now the scenario\u2019s bed. Undo with Ctrl+Z; run to see the glacier on it.' }
        : { ok: false, text: `Not applied: ${done.errors.map(formatMessage).join('; ')}` },
    );
  };

  const rows: [string, string][] = [
    ['Terminus', formatKm(r.terminus)],
    ['Largest thickness', metres(maxThickness)],
    ['Multiplier of A', fitted ? r.rateFactorMultiplier.toPrecision(3) : '1 (not fitted)'],
    ...(r.rateFactorMultiplierRange
      ? [['Range of the multiplier', `${r.rateFactorMultiplierRange[0].toPrecision(3)} to ${r.rateFactorMultiplierRange[1].toPrecision(3)}`] as [string, string]]
      : [['Band shown', 'A / 2 to 2 A'] as [string, string]]),
    ...(r.misfit
      ? ([
          ['Thickness points compared', String(r.misfit.count)],
          ['Misfit to measured thickness, RMS', metres(r.misfit.rmsMetres)],
          ['Misfit to measured thickness, bias', metres(r.misfit.biasMetres)],
        ] as [string, string][])
      : []),
  ];
  return (
    <div className="analysis-result">
      <CautionNotice />
      {r.multiplierAtSearchBound && (
        <p className="notice" role="status">
          The fitted multiplier lies at the end of the range searched (0.001 to 1000): the thickness points are not matched by any reasonable A; check them and the surface.
        </p>
      )}
      <AnalysisNumbers name="inversion" rows={rows} />
      <h3 className="analysis-subheading">Assumptions</h3>
      <ul className="inversion-statements" data-numbers="inversion-statements">
        {r.statements.map((s) => (
          <li key={s}>{s}</li>
        ))}
      </ul>
      <div className="button-row">
        <button type="button" className="primary" disabled={!current} onClick={apply}>
          Apply this bed to the scenario
        </button>
        {previewShown ? (
          <button type="button" onClick={() => useAnalysisStore.getState().setInversionPreview(false)}>
            Discard the preview
          </button>
        ) : (
          <button type="button" onClick={() => useAnalysisStore.getState().setInversionPreview(true)}>
            Show the preview
          </button>
        )}
      </div>
      {!current && !applied && <p className="analysis-note">The scenario has changed since this bed was computed; compute it again to apply it.</p>}
      {applied && (
        <p className={applied.ok ? 'analysis-note' : 'field-error'} role="status">
          {applied.text}
        </p>
      )}
    </div>
  );
}
