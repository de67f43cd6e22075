/**
 * Opens and saves experiment files in the firnline-experiment format of the command line. A file
 * that does not validate is refused whole, its errors named as the command line names them.
 */
import { useRef, useState, type ChangeEvent } from 'react';
import type { Experiment } from '../../experiment/experimentSchema';
import { useExperimentStore } from '../../state/experimentStore';
import { downloadText, experimentFileName, experimentFileText, finishedOutcomeRows, outcomesCsvText, refusedFileLines } from './experimentFile';
import { FieldMessages } from './FieldMessages';
import { readChosenFile } from '../app/readChosenFile';

export function ExperimentFileButtons({ experiment, disabled }: { experiment: Experiment; disabled: boolean }) {
  const input = useRef<HTMLInputElement>(null);
  const [errors, setErrors] = useState<string[]>([]);
  const [note, setNote] = useState<string | null>(null);
  const finished = useExperimentStore((s) => s.runStatus === 'done');

  async function open(event: ChangeEvent<HTMLInputElement>) {
    const chosen = await readChosenFile(event);
    if (!chosen) return;
    setNote(null);
    if (chosen.problem !== undefined) return setErrors([chosen.problem]);
    const file = chosen;
    const opened = await useExperimentStore.getState().openText(chosen.text);
    if (!opened.ok) return setErrors(refusedFileLines(file.name, opened.errors));
    setErrors([]);
    setNote(`Opened ${file.name}: its base and members replace the experiment (the workbench scenario is unchanged).`);
  }

  return (
    <section className="panel" aria-labelledby="experiment-files-heading">
      <h2 id="experiment-files-heading">Experiment files</h2>
      <div className="button-row">
        <button type="button" onClick={() => input.current?.click()} disabled={disabled}>
          Open experiment file…
        </button>
        <button type="button" onClick={() => downloadText(experimentFileName(experiment), experimentFileText(experiment), 'application/json')}>
          Save experiment file
        </button>
        <button
          type="button"
          disabled={!finished}
          onClick={() => downloadText('outcomes.csv', outcomesCsvText(finishedOutcomeRows(useExperimentStore.getState().runs)), 'text/csv')}
        >
          Save outcomes.csv
        </button>
      </div>
      <p className="field-help">The same file format as <code>firnline experiment</code> on the command line.</p>
      <input ref={input} type="file" accept=".json,application/json" aria-label="Experiment file to open" hidden onChange={(event) => void open(event)} />
      <FieldMessages errors={errors} note={note} prefix="" />
    </section>
  );
}
