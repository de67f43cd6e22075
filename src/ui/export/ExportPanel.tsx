/**
 * Exports of the run on screen: figures (SVG, PNG at a chosen size and resolution, PDF), the data
 * (one ZIP with the CSV files, summary, scenario and a README) and the one-page report sheet.
 * Only results of the current scenario can be exported: figures of stale results would be
 * captioned with parameters that did not make them.
 */
import { useEffect, useId, useMemo, useRef, useState } from 'react';
import type { FigureRun } from '../../figures/figureRun';
import { roundInterval } from '../../figures/snapshotYears';
import { usePlaybackStore } from '../../state/playbackStore';
import { isActive, useResultsStale, useRunStore } from '../../state/runStore';
import { useScenarioStore } from '../../state/scenarioStore';
import { FIRNLINE_VERSION } from '../../version';
import { downloadBlob } from '../app/downloadBlob';
import {
  dataFile,
  FIGURE_KINDS,
  figureFile,
  isoDate,
  reportFile,
  type ExportFile,
  type FigureFormat,
  type FigureKind,
  type ProfileChoice,
} from './exportActions';
import { checkExportSettings } from './exportSettings';
import { pngPixelSize } from './rasterise';
import { useOnScreen } from './useOnScreen';
import { whenIdle } from './whenIdle';
import { figureSvg } from './exportActions';
import type { Paper } from './reportSheet';
import './export.css';

function useFigureRun(): FigureRun | null {
  const grid = useRunStore((s) => s.grid);
  const frames = useRunStore((s) => s.frames);
  const scenario = useScenarioStore((s) => s.scenario);
  return useMemo(
    () => (grid && frames.length > 0 ? { scenario, grid, frames, firnlineVersion: FIRNLINE_VERSION } : null),
    [grid, frames, scenario],
  );
}

/** Why exports are not available now, or null when they are. */
function useBlockedReason(run: FigureRun | null): string | null {
  const status = useRunStore((s) => s.status);
  const summary = useRunStore((s) => s.summary);
  const stale = useResultsStale();
  if (!run) return 'Run the scenario first: exports are made from its results.';
  if (stale) return 'The scenario has changed since this run: run it again to export results that match its parameters.';
  if (isActive(status) || !summary) return 'Exports are offered when the run has finished (or has been stopped).';
  return null;
}

export function ExportPanel() {
  const run = useFigureRun();
  const blocked = useBlockedReason(run);
  const summary = useRunStore((s) => s.summary);
  const index = usePlaybackStore((s) => s.index);
  const runYears = useRunStore((s) => s.years);
  const ids = { width: useId(), dpi: useId(), every: useId(), kind: useId(), profiles: useId(), paper: useId(), problems: useId() };

  const [kind, setKind] = useState<FigureKind>('profile');
  const [widthMm, setWidthMm] = useState('170');
  const [dpi, setDpi] = useState('300');
  const [every, setEvery] = useState<string | null>(null);
  const [caption, setCaption] = useState(true);
  const [profiles, setProfiles] = useState<ProfileChoice>('all');
  const [paper, setPaper] = useState<Paper>('a4');
  const [busy, setBusy] = useState(false);
  const [status, setStatus] = useState<{ text: string; error: boolean } | null>(null);

  const everyText = every ?? String(roundInterval(runYears));
  const checked = useMemo(() => checkExportSettings({ widthMm, dpi, every: everyText }, runYears), [widthMm, dpi, everyText, runYears]);
  const year = run ? run.frames[Math.min(index, run.frames.length - 1)].time : 0;
  // The PNG's pixel size follows the figure's laid-out aspect, so it is worked out from the figure itself.
  const settingsKey = checked.ok ? `${checked.settings.widthMm}|${checked.settings.dpi}|${checked.settings.every}` : '';
  // Worked out when the page is idle, not while playing, and only while the panel is in view:
  // laying out a whole figure (tens of milliseconds the first time) in the same task as a run's
  // last frame, on every frame of playback, or just as the user presses Run again would hold up
  // the page for a number nobody is looking at.
  const playing = usePlaybackStore((s) => s.playing);
  const panelRef = useRef<HTMLElement>(null);
  const inView = useOnScreen(panelRef);
  const [pngSize, setPngSize] = useState<{ key: string; width: number; height: number } | null>(null);
  const sizeKey = run && checked.ok && !blocked && !playing && inView ? `${kind}|${year}|${caption}|${settingsKey}` : null;
  useEffect(() => {
    if (!sizeKey || !run || !checked.ok) return undefined;
    const settings = checked.settings;
    return whenIdle(() => setPngSize({ key: sizeKey, ...pngPixelSize(figureSvg(run, kind, year, settings, caption).svg, settings.widthMm, settings.dpi) }));
  }, [run, sizeKey, checked, kind, year, caption]);
  const shownPngSize = pngSize && pngSize.key === sizeKey ? pngSize : null;

  const save = async (make: () => Promise<ExportFile> | ExportFile) => {
    setBusy(true);
    setStatus({ text: 'Making the file…', error: false });
    try {
      const file = await make();
      downloadBlob(file.blob, file.fileName);
      setStatus({ text: `Saved ${file.fileName} (${Math.max(1, Math.round(file.blob.size / 1024))} KB).`, error: false });
    } catch (error) {
      setStatus({ text: `Export failed: ${error instanceof Error ? error.message : String(error)}. Nothing was saved.`, error: true });
    } finally {
      setBusy(false);
    }
  };
  const figure = (format: FigureFormat) => {
    if (!run || !checked.ok) return;
    void save(() => figureFile(run, kind, format, year, checked.settings, caption));
  };
  const disabled = busy || blocked !== null || !checked.ok;

  return (
    <section ref={panelRef} className="panel export-panel" aria-labelledby="export-heading">
      <h2 id="export-heading">Export</h2>
      {blocked && <p className="export-blocked">{blocked}</p>}
      <fieldset className="export-group" disabled={blocked !== null}>
        <legend>Figure</legend>
        <div className="export-fields">
          <label htmlFor={ids.kind}>Figure</label>
          <select id={ids.kind} value={kind} onChange={(e) => setKind(e.target.value as FigureKind)}>
            {FIGURE_KINDS.map((k) => (
              <option key={k.kind} value={k.kind}>
                {k.label}
              </option>
            ))}
          </select>
          <label htmlFor={ids.every}>Years between snapshots</label>
          <input id={ids.every} inputMode="decimal" value={everyText} onChange={(e) => setEvery(e.target.value)} aria-describedby={ids.problems} />
          <label htmlFor={ids.width}>Width (mm)</label>
          <input id={ids.width} inputMode="decimal" value={widthMm} onChange={(e) => setWidthMm(e.target.value)} aria-describedby={ids.problems} />
          <label htmlFor={ids.dpi}>PNG resolution (dpi)</label>
          <input id={ids.dpi} inputMode="decimal" value={dpi} onChange={(e) => setDpi(e.target.value)} aria-describedby={ids.problems} />
        </div>
        <label className="export-check">
          <input type="checkbox" checked={caption} onChange={(e) => setCaption(e.target.checked)} /> Caption with the key parameters
        </label>
        <p className="export-note">
          {kind === 'profile' || kind === 'along-flow' ? `At model year ${year} (the year shown). ` : ''}
          {shownPngSize ? `PNG: ${shownPngSize.width} × ${shownPngSize.height} px.` : ''}
        </p>
        <div className="button-row">
          <button type="button" disabled={disabled} onClick={() => figure('svg')}>
            SVG
          </button>
          <button type="button" disabled={disabled} onClick={() => figure('png')}>
            PNG
          </button>
          <button type="button" disabled={disabled} onClick={() => figure('pdf')}>
            PDF
          </button>
        </div>
      </fieldset>
      <fieldset className="export-group" disabled={blocked !== null}>
        <legend>Data and report</legend>
        <div className="export-fields">
          <label htmlFor={ids.profiles}>Profiles of</label>
          <select id={ids.profiles} value={profiles} onChange={(e) => setProfiles(e.target.value as ProfileChoice)}>
            <option value="all">every output year</option>
            <option value="shown">the shown year ({year})</option>
            <option value="snapshots">the snapshot years</option>
          </select>
          <label htmlFor={ids.paper}>Report paper</label>
          <select id={ids.paper} value={paper} onChange={(e) => setPaper(e.target.value as Paper)}>
            <option value="a4">A4</option>
            <option value="letter">Letter</option>
          </select>
        </div>
        <div className="button-row">
          <button
            type="button"
            disabled={disabled}
            onClick={() => run && summary && checked.ok && void save(() => dataFile(run, summary, profiles, year, checked.settings, isoDate()))}
          >
            Data (.zip)
          </button>
          <button type="button" disabled={disabled} onClick={() => run && summary && void save(() => reportFile(run, summary, year, paper, isoDate()))}>
            Report sheet (PDF)
          </button>
        </div>
      </fieldset>
      <div id={ids.problems}>
        {!checked.ok &&
          checked.messages.map((m) => (
            <p key={m} className="field-error" role="alert">
              {m}
            </p>
          ))}
      </div>
      {status && (
        <p className={status.error ? 'export-status field-error' : 'export-status'} role="status">
          {status.text}
        </p>
      )}
    </section>
  );
}
