import { beforeEach, describe, expect, it } from 'vitest';
import { demoScenario, HISTORY_LIMIT, useScenarioStore } from '../../src/state/scenarioStore';
import { resetStores } from '../helpers/resetStores';

const withEla = (ela: number) => ({
  ...demoScenario,
  massBalance: { ...demoScenario.massBalance, ela } as typeof demoScenario.massBalance,
});

describe('scenario store history', () => {
  beforeEach(resetStores);

  it('apply then undo restores the previous document; redo re-applies it', () => {
    const store = useScenarioStore;
    store.getState().apply(withEla(2900), 'Set ELA');
    expect(store.getState().scenario.massBalance).toMatchObject({ ela: 2900 });
    store.getState().undo();
    expect(store.getState().scenario).toBe(demoScenario);
    store.getState().redo();
    expect(store.getState().scenario.massBalance).toMatchObject({ ela: 2900 });
    expect(store.getState().label).toBe('Set ELA');
  });

  it('a new edit after undo clears the redo list', () => {
    const store = useScenarioStore;
    store.getState().apply(withEla(2900), 'Set ELA');
    store.getState().undo();
    store.getState().apply(withEla(2700), 'Set ELA');
    expect(store.getState().future).toHaveLength(0);
  });

  it('every change bumps the revision, so older results read as stale', () => {
    const store = useScenarioStore;
    const start = store.getState().revision;
    store.getState().apply(withEla(2900), 'Set ELA');
    store.getState().undo();
    store.getState().redo();
    expect(store.getState().revision).toBe(start + 3);
  });

  it(`keeps at most ${HISTORY_LIMIT} undo steps`, () => {
    const store = useScenarioStore;
    for (let k = 0; k < HISTORY_LIMIT + 20; k++) store.getState().apply(withEla(2000 + k), 'Set ELA');
    expect(store.getState().past).toHaveLength(HISTORY_LIMIT);
  });
});
