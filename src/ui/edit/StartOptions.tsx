/**
 * How a run starts (the Climate and run tab): steady (spin-up under the year-0 climate), as drawn
 * (the initial surface, no spin-up), or from the glacier as it is today (the scenario's `start`):
 * from the observed surface over the bed as given, or a transient start from a past steady state
 * carried through the warming history, with its start year and climate offset (empty: fitted to
 * the observed terminus and volume). Each choice is one undoable edit through commitEdit; a
 * choice the validator refuses (no observed surface, an observation year other than 0, no
 * observed terminus for a fit) is refused at the field with its reason.
 */
import { useId, useState } from 'react';
import type { Scenario, StartSpec } from '../../model/scenario';
import { MAX_OFFSET_K } from '../../model/todayStart';
import { START_YEAR_MIN } from '../../scenario/startSchema';
import { useScenarioStore } from '../../state/scenarioStore';
import { commitEdit } from './commitEdit';
import { ScenarioNumberField } from './ScenarioNumberField';

type StartChoice = 'steady' | 'drawn' | 'observed' | 'transient';

function choiceOf(s: Scenario): StartChoice {
  if (s.start) return s.start.from;
  return s.spinup ? 'steady' : 'drawn';
}

/** A start year for a new transient start: the warming's first year when before 0, else -100 a. */
function defaultStartYear(s: Scenario): number {
  const first = s.warming?.[0]?.[0];
  return first !== undefined && first < 0 && first >= START_YEAR_MIN ? first : -100;
}

/** The scenario with the chosen start (spinup and start set, the other removed). */
export function withStartChoice(s: Scenario, choice: StartChoice): Scenario {
  const { spinup: _spinup, start: _start, ...rest } = s;
  switch (choice) {
    case 'steady':
      return { ...rest, spinup: true };
    case 'drawn':
      return { ...rest, spinup: false };
    case 'observed':
      return { ...rest, start: { from: 'observed' } };
    case 'transient':
      return { ...rest, start: s.start?.from === 'transient' ? s.start : { from: 'transient', startYear: defaultStartYear(s) } };
  }
}

const CHOICES: { value: StartChoice; label: string; help: string }[] = [
  { value: 'steady', label: 'Spin up to a steady state before year 0', help: 'Under the year-0 climate.' },
  { value: 'drawn', label: 'From the initial surface as drawn', help: 'No spin-up.' },
  { value: 'observed', label: 'Today, as observed', help: 'Year 0 is the observation year: from the surface over the bed as given (e.g. the inverted bed).' },
  {
    value: 'transient',
    label: 'Today, from a transient past',
    help: 'A steady state under the warming at the start year plus an offset, run through the warming history to year 0 (the observation year).',
  },
];

export function StartOptions() {
  const id = useId();
  const scenario = useScenarioStore((s) => s.scenario);
  const choice = choiceOf(scenario);
  const [refusal, setRefusal] = useState<string | null>(null);
  const start = scenario.start;
  const transient = start?.from === 'transient' ? start : undefined;

  const choose = (next: StartChoice) => {
    const result = commitEdit(withStartChoice(useScenarioStore.getState().scenario, next), `Start: ${CHOICES.find((c) => c.value === next)!.label.toLowerCase()}`);
    setRefusal(result.ok ? null : `Not applied: ${result.errors.map((e) => `${e.path}: ${e.message}`).join('; ')}`);
  };
  const withTransient = (s: Scenario, patch: Partial<Extract<StartSpec, { from: 'transient' }>>): Scenario => {
    const current = s.start?.from === 'transient' ? s.start : { from: 'transient' as const, startYear: defaultStartYear(s) };
    const next = { ...current, ...patch };
    if (next.climateOffset === undefined) delete next.climateOffset;
    return { ...s, start: next };
  };

  return (
    <div className="field" role="radiogroup" aria-labelledby={`${id}-legend`}>
      <p id={`${id}-legend`} className="field-label">
        Start of the run
      </p>
      {CHOICES.map((c) => (
        <label key={c.value} className="radio-choice">
          <input type="radio" name={`${id}-start`} value={c.value} checked={choice === c.value} onChange={() => choose(c.value)} /> {c.label}
          <span className="field-help"> {c.help}</span>
        </label>
      ))}
      {refusal && (
        <p className="field-error" role="alert">
          {refusal}
        </p>
      )}
      {transient && (
        <>
          <ScenarioNumberField
            label="Start year"
            unit="a"
            path="/start/startYear"
            value={transient.startYear}
            build={(s, v) => withTransient(s, { startYear: v as number })}
            help={`Model year the history starts, at least ${START_YEAR_MIN.toLocaleString('en')} and before year 0 (the observation year).`}
          />
          <ScenarioNumberField
            label="Climate offset"
            unit="K"
            path="/start/climateOffset"
            value={transient.climateOffset}
            optional
            build={(s, v) => withTransient(s, { climateOffset: v })}
            help={`Added to the warming at the start year during the spin-up, -${MAX_OFFSET_K} to ${MAX_OFFSET_K} K; empty: fitted to the observed terminus and volume at year 0.`}
          />
        </>
      )}
    </div>
  );
}
