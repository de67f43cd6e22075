/**
 * The preview worker's driver with a hand-cranked scheduler: it computes in slices, ends on the
 * same glacier as the direct call, and a newer generation (or a cancel) replaces the job under
 * way between two slices, so the old one never answers.
 */
import { describe, expect, it } from 'vitest';
import demo from '../../examples/demo-valley.json';
import { runToEnd } from '../../src/model/analysis/stepwise';
import { steadyGlacierSteps } from '../../src/model/steadyGlacier';
import { createPreviewDriver } from '../../src/worker/steadyPreviewDriver';
import type { FromPreviewWorker } from '../../src/worker/steadyPreviewProtocol';
import { checkedJson, unchecked } from '../helpers/checkedScenario';

const scenario = checkedJson(demo);
const lowerEla = checkedJson({ ...demo, massBalance: { ...demo.massBalance, ela: 2700 } });

function harness() {
  const received: FromPreviewWorker[] = [];
  const transfers: ArrayBuffer[][] = [];
  const queue: (() => void)[] = [];
  let clock = 0;
  const driver = createPreviewDriver(
    (message, transfer) => {
      received.push(structuredClone(message));
      transfers.push(transfer);
    },
    (resume) => queue.push(resume),
    // Each reading of the clock moves it on 1 ms, so a slice holds a few steps of 10 model years.
    () => (clock += 1),
  );
  const crank = (limit = Infinity) => {
    let n = 0;
    for (; n < limit && queue.length; n++) queue.shift()!();
    return n;
  };
  return { driver, received, transfers, crank, queue };
}

describe('steady-glacier preview driver', () => {
  it('computes in several slices and answers with the glacier of the direct call, its arrays transferred', () => {
    const h = harness();
    h.driver.handle({ type: 'compute', generation: 1, scenario });
    expect(h.received).toEqual([]); // nothing before the first slice
    const slices = h.crank();
    expect(slices).toBeGreaterThan(3);
    expect(h.received).toHaveLength(1);
    const answer = h.received[0];
    expect(answer.type).toBe('result');
    if (answer.type !== 'result') return;
    const direct = runToEnd(steadyGlacierSteps(scenario));
    expect(answer.generation).toBe(1);
    expect(answer.glacier.terminus).toBe(direct.terminus);
    expect(answer.glacier.volume).toBe(direct.volume);
    expect(answer.glacier.years).toBe(direct.years);
    expect(h.transfers[0]).toHaveLength(3);
  });

  it('drops the job under way when a newer generation arrives between slices: only the newer one answers', () => {
    const h = harness();
    h.driver.handle({ type: 'compute', generation: 1, scenario });
    h.crank(2);
    expect(h.received).toEqual([]);
    h.driver.handle({ type: 'compute', generation: 2, scenario: lowerEla });
    h.crank();
    expect(h.received.map((m) => [m.type, m.generation])).toEqual([['result', 2]]);
    const answer = h.received[0];
    if (answer.type !== 'result') throw new Error('expected a result');
    expect(answer.glacier.terminus).toBe(runToEnd(steadyGlacierSteps(lowerEla)).terminus);
  });

  it('stops on cancel and ignores messages of an older generation than one already seen', () => {
    const h = harness();
    h.driver.handle({ type: 'compute', generation: 3, scenario });
    h.crank(1);
    h.driver.handle({ type: 'cancel', generation: 4 });
    h.crank();
    expect(h.received).toEqual([]);
    // A late message of generation 2 (overtaken by 3 and 4) starts nothing.
    h.driver.handle({ type: 'compute', generation: 2, scenario });
    expect(h.crank()).toBe(0);
    expect(h.received).toEqual([]);
  });

  it('reports a scenario the model cannot build as a failure of its generation', () => {
    const h = harness();
    h.driver.handle({ type: 'compute', generation: 5, scenario: unchecked({ ...scenario, grid: { length: 12000, spacing: -1 } }) });
    h.crank();
    expect(h.received).toHaveLength(1);
    expect(h.received[0]).toMatchObject({ type: 'failed', generation: 5 });
  });
});
