/**
 * The experiment of the open project: the document (the firnline-experiment file format; its base
 * is taken from the workbench scenario), its members, and the state of a run of those members on
 * the worker pool. Like the scenario store, every edit is a complete document checked by the one
 * validator (validateExperiment) and applied whole, or refused with the messages and not applied.
 * Results are not saved; a changed document drops them (they would no longer match it).
 */
import { create } from 'zustand';
import { memberCount } from '../experiment/experimentMembers';
import { EXPERIMENT_FORMAT, EXPERIMENT_VERSION, type Experiment } from '../experiment/experimentSchema';
import type { ExperimentMember, ExperimentValidation, ValidExperiment } from '../experiment/validateExperiment';
import type { ValidationMessage } from '../scenario/validationMessage';
import { outputTimes } from '../model/runScenario';
import type { Scenario } from '../model/scenario';
import type { MemberProgress } from '../worker/experimentProtocol';
import { checkExperiment, checkNow, type CheckRequest } from '../worker/experimentCheckClient';
import type { MemberRunResult } from '../worker/experimentMemberRun';
import { runExperimentPool, type CreateMemberWorker, type PoolRun } from '../worker/experimentPool';

export type MemberRunStatus = 'waiting' | 'running' | 'done' | 'failed' | 'cancelled';

export type MemberResultOk = Extract<MemberRunResult, { status: 'ok' }>;

export interface MemberRunState {
  status: MemberRunStatus;
  progress: MemberProgress | null;
  result: MemberResultOk | null;
  /** Why the member failed. */
  message: string | null;
  /** The member's outcomes.csv row, once it has finished (ok or failed). */
  outcomeRow: string | null;
}

export type ExperimentRunStatus = 'idle' | 'running' | 'done' | 'cancelled';

export type ExperimentEdit = { ok: true } | { ok: false; errors: ValidationMessage[] };

/** How the store reaches workers; the app passes the browser's, tests pass fakes. */
export interface PoolOptions {
  createWorker: CreateMemberWorker;
  /** Workers to use for this many members. */
  size: (members: number) => number;
}

export interface ExperimentState {
  /**
   * null until the experiments view is first opened (or a project without one is opened). As the
   * validator returned it: its base is a checked scenario.
   */
  experiment: ValidExperiment | null;
  /** The validated members of `experiment`, in member order. */
  members: ExperimentMember[];
  runStatus: ExperimentRunStatus;
  /** One entry per member of the last run; empty before a run and after an edit. */
  runs: MemberRunState[];
  /** Workers used by the current or last run. */
  workers: number;
  /** Members being checked (a large edit is validated off the page's thread), or 0. */
  checking: number;
  /** Why the last Run was refused, or null. */
  runProblem: string | null;
  /** A new experiment with the given scenario as base and no variants (one member: the base). */
  startFrom: (scenario: Scenario, name?: string) => ExperimentEdit;
  /** Replaces the document, if it validates; nothing changes otherwise. */
  edit: (next: Experiment) => Promise<ExperimentEdit>;
  /** Opens a saved or restored document (null: none); a run in progress is cancelled. */
  load: (experiment: Experiment | null) => Promise<ExperimentEdit>;
  /** Opens the text of an experiment file, checked whole (JSON syntax, then the validator). */
  openText: (text: string) => Promise<ExperimentEdit>;
  run: (pool: PoolOptions) => Promise<ExperimentRunStatus>;
  cancel: () => void;
}

/**
 * Most memory the results of one run may take [bytes]: every member keeps its numbers at each
 * output time and its final profile. Beyond it Run is refused with the reason; the command line
 * (which writes to disk) has no such limit.
 */
export const RESULT_MEMORY_BUDGET_BYTES = 512 * 1024 * 1024;

/** Bytes the results of these members will take: 5 numbers per output, 5 per cell, 8 bytes each. */
export function resultBytes(members: readonly Pick<ExperimentMember, 'scenario'>[]): number {
  // Members mostly share their run length: count each distinct one's outputs once.
  const outputCounts = new Map<string, number>();
  let bytes = 0;
  for (const { scenario } of members) {
    const key = `${scenario.run.years}|${scenario.run.outputEvery}`;
    let outputs = outputCounts.get(key);
    if (outputs === undefined) outputCounts.set(key, (outputs = outputTimes(scenario.run).length));
    const cells = Math.round(scenario.grid.length / scenario.grid.spacing);
    bytes += (outputs + cells) * 5 * 8;
  }
  return bytes;
}

/** Least time between two updates of the views while members report [ms]. */
export const EXPERIMENT_UPDATE_INTERVAL_MS = 100;

export const RUNNING_EDIT_REFUSED: ValidationMessage = {
  path: '',
  message: 'the experiment is running; cancel the run (or wait for it to finish) before changing it',
};

export const CHECKING_EDIT_REFUSED: ValidationMessage = {
  path: '',
  message: 'the previous change is still being checked; wait for it before changing the experiment again',
};

let activeRun: PoolRun | undefined;

export function newExperiment(scenario: Scenario, name?: string): Experiment {
  const title = name ?? `Experiment on ${scenario.name ?? 'the workbench scenario'}`;
  return { format: EXPERIMENT_FORMAT, version: EXPERIMENT_VERSION, name: title.slice(0, 200), base: scenario };
}

const waiting = (): MemberRunState => ({ status: 'waiting', progress: null, result: null, message: null, outcomeRow: null });

export const useExperimentStore = create<ExperimentState>()((set, get) => {
  /** Counts changes, so a check that finishes after a newer change is not applied over it. */
  let generation = 0;

  const apply = (checked: ExperimentValidation): ExperimentEdit => {
    if (!checked.ok) return { ok: false, errors: checked.errors };
    set({ experiment: checked.experiment, members: checked.members, runs: [], runStatus: 'idle', runProblem: null });
    return { ok: true };
  };

  const replace = async (request: CheckRequest, document?: Experiment): Promise<ExperimentEdit> => {
    const mine = ++generation;
    const checking = 'experiment' in request ? memberCount(
            document?.variants?.length ?? 0,
            document?.sweep,
            Number.isInteger(document?.ensemble?.members) ? Math.max(1, document!.ensemble!.members) : 1,
          )
        : 1;
    set({ checking });
    try {
      const checked = await checkExperiment(request);
      if (mine !== generation) return { ok: false, errors: [CHECKING_EDIT_REFUSED] };
      return apply(checked);
    } finally {
      if (mine === generation) set({ checking: 0 });
    }
  };

  const refusal = (): ExperimentEdit | null => {
    if (get().runStatus === 'running') return { ok: false, errors: [RUNNING_EDIT_REFUSED] };
    if (get().checking > 0) return { ok: false, errors: [CHECKING_EDIT_REFUSED] };
    return null;
  };

  return {
    experiment: null,
    members: [],
    runStatus: 'idle',
    runs: [],
    workers: 0,
    checking: 0,
    runProblem: null,

    startFrom(scenario, name) {
      const refused = refusal();
      if (refused) return refused;
      // One member: checked at once, here.
      const document = newExperiment(scenario, name);
      generation++;
      return apply(checkNow({ experiment: document }));
    },

    async edit(next) {
      return refusal() ?? replace({ experiment: next }, next);
    },

    async load(experiment) {
      get().cancel();
      if (experiment === null) {
        generation++;
        set({ experiment: null, members: [], runs: [], runStatus: 'idle', checking: 0 });
        return { ok: true };
      }
      return replace({ experiment }, experiment);
    },

    async openText(text) {
      return refusal() ?? replace({ text });
    },

    async run(pool) {
      const { members, runStatus } = get();
      if (runStatus === 'running' || members.length === 0) return runStatus;
      const bytes = resultBytes(members);
      if (bytes > RESULT_MEMORY_BUDGET_BYTES) {
        const mb = (b: number) => `${Math.round(b / 1024 / 1024).toLocaleString('en-GB')} MB`;
        set({
          runProblem:
            `Not run: the results of these ${members.length.toLocaleString('en-GB')} members would take about ${mb(bytes)} in the browser; ` +
            `at most ${mb(RESULT_MEMORY_BUDGET_BYTES)} is allowed. Use fewer members, a longer output interval or a coarser grid, ` +
            'or run the experiment file with `firnline experiment` on the command line, which writes its results to disk.',
        });
        return runStatus;
      }
      const runs = members.map(waiting);
      const workers = pool.size(members.length);
      set({ runs, runStatus: 'running', workers, runProblem: null });

      // Messages are gathered and shown together at most every EXPERIMENT_UPDATE_INTERVAL_MS,
      // so a burst of progress from many workers costs one render.
      const pending = new Map<number, Partial<MemberRunState>>();
      let timer: ReturnType<typeof setTimeout> | undefined;
      let current = runs;
      const flush = () => {
        timer = undefined;
        if (pending.size === 0 || get().runs !== current) return;
        current = current.map((r, k) => (pending.has(k) ? { ...r, ...pending.get(k) } : r));
        pending.clear();
        set({ runs: current });
      };
      const update = (index: number, change: Partial<MemberRunState>) => {
        pending.set(index, { ...pending.get(index), ...change });
        timer ??= setTimeout(flush, EXPERIMENT_UPDATE_INTERVAL_MS);
      };

      const jobs = members.map((m) => ({ index: m.index, name: m.name, scenario: m.scenario }));
      const handle = runExperimentPool(jobs, workers, pool.createWorker, {
        onStart: (index) => update(index, { status: 'running' }),
        onProgress: (index, progress) => update(index, { status: 'running', progress }),
        onResult: (index, result) =>
          update(
            index,
            result.status === 'ok'
              ? { status: 'done', result, message: null, outcomeRow: result.outcomeRow }
              : { status: 'failed', result: null, message: result.message, outcomeRow: result.outcomeRow },
          ),
      });
      activeRun = handle;
      const how = await handle.finished;
      if (activeRun === handle) activeRun = undefined;
      clearTimeout(timer);
      flush();
      // A load or an edit in between has replaced these runs: leave the new state alone.
      if (get().runs !== current) return get().runStatus;
      if (how === 'cancelled') {
        current = current.map((r) => (r.status === 'waiting' || r.status === 'running' ? { ...r, status: 'cancelled', progress: null } : r));
      }
      set({ runs: current, runStatus: how });
      return how;
    },

    cancel() {
      activeRun?.cancel();
    },
  };
});
