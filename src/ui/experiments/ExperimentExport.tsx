/**
 * Exports of an experiment's results: the length and volume chart as SVG, PNG or PDF (the same
 * figure code as every other export), and the data as one ZIP with experiment.csv, outcomes.csv,
 * the experiment file and a README with the version and the caution.
 */
import { useId, useState } from 'react';
import { experimentFigure } from '../../figures/experimentFigure';
import { experimentArchive } from '../../outputs/experimentArchive';
import type { ValidExperiment } from '../../experiment/validateExperiment';
import { useExperimentStore } from '../../state/experimentStore';
import { FIRNLINE_VERSION } from '../../version';
import { downloadBlob } from '../app/downloadBlob';
import { figureBlob, isoDate } from '../export/exportActions';
import { figureSizeProblems, formNumber } from '../export/exportSettings';
import { experimentFileName, experimentFileText, finishedOutcomeRows } from './experimentFile';
import type { FinishedMember } from './finishedMembers';

export function ExperimentExport({
  experiment,
  finished,
  bands,
  percentileBands = false,
}: {
  experiment: ValidExperiment;
  finished: readonly FinishedMember[];
  bands: boolean;
  percentileBands?: boolean;
}) {
  const ids = { width: useId(), dpi: useId() };
  const [widthMm, setWidthMm] = useState('170');
  const [dpi, setDpi] = useState('300');
  const [status, setStatus] = useState<{ text: string; error: boolean } | null>(null);
  const [busy, setBusy] = useState(false);
  const problems = figureSizeProblems({ widthMm, dpi });
  const stem = experimentFileName(experiment).replace(/\.experiment\.json$/, '');

  const save = async (make: () => Promise<{ blob: Blob; fileName: string }>) => {
    setBusy(true);
    try {
      const file = await make();
      downloadBlob(file.blob, file.fileName);
      setStatus({ text: `Saved ${file.fileName}.`, error: false });
    } catch (error) {
      setStatus({ text: `Export failed: ${error instanceof Error ? error.message : String(error)}. Nothing was saved.`, error: true });
    } finally {
      setBusy(false);
    }
  };
  const svg = () => {
    // The caption lists the base scenario's parameters.
    return experimentFigure({
      experimentName: experiment.name ?? 'Experiment',
      base: experiment.base,
      members: finished.map((m) => ({ name: m.label, group: m.group, ensembleGroup: m.ensembleGroup, style: m.style, times: m.result.series.times, length: m.result.series.length, volume: m.result.series.volume })),
      bands,
      percentileBands,
      firnlineVersion: FIRNLINE_VERSION,
      caption: true,
      widthMm: formNumber(widthMm),
    });
  };
  const figure = (format: 'svg' | 'png' | 'pdf') =>
    void save(async () => {
      const text = svg();
      const fileName = `${stem}_members.${format}`;
      return { blob: await figureBlob(text, format, formNumber(widthMm), formNumber(dpi), 'Experiment members'), fileName };
    });
  const data = () =>
    void save(async () => {
      const bytes = experimentArchive({
        members: finished.map((m) => ({ name: m.name, series: m.result.series })),
        outcomeRows: finishedOutcomeRows(useExperimentStore.getState().runs),
        experimentFileName: experimentFileName(experiment),
        experimentFileText: experimentFileText(experiment),
        firnlineVersion: FIRNLINE_VERSION,
        date: isoDate(),
      });
      return { blob: new Blob([bytes as BlobPart], { type: 'application/zip' }), fileName: `${stem}_data.zip` };
    });
  const disabled = busy || finished.length === 0;

  return (
    <section className="experiment-export" aria-label="Export the experiment">
      <h3>Export</h3>
      <div className="export-fields">
        <label htmlFor={ids.width}>Width (mm)</label>
        <input id={ids.width} inputMode="decimal" value={widthMm} onChange={(e) => setWidthMm(e.target.value)} />
        <label htmlFor={ids.dpi}>PNG resolution (dpi)</label>
        <input id={ids.dpi} inputMode="decimal" value={dpi} onChange={(e) => setDpi(e.target.value)} />
      </div>
      {problems.map((m) => (
        <p key={m} className="field-error" role="alert">
          {m}
        </p>
      ))}
      <div className="button-row">
        <span>Length and volume chart:</span>
        <button type="button" disabled={disabled || problems.length > 0} onClick={() => figure('svg')}>
          SVG
        </button>
        <button type="button" disabled={disabled || problems.length > 0} onClick={() => figure('png')}>
          PNG
        </button>
        <button type="button" disabled={disabled || problems.length > 0} onClick={() => figure('pdf')}>
          PDF
        </button>
        <button type="button" disabled={disabled} onClick={data}>
          Experiment data (.zip)
        </button>
      </div>
      {status && (
        <p className={status.error ? 'field-error' : 'experiment-note'} role="status">
          {status.text}
        </p>
      )}
    </section>
  );
}
