/**
 * The real analysis driver behind the AnalysisWorkerLike interface, in the test process: messages
 * go through structuredClone both ways (as postMessage copies them) and slices run on timers, so
 * component tests exercise the whole path from button to result without a browser.
 */
import type { FromAnalysisWorker, ToAnalysisWorker } from '../../src/worker/analysisProtocol';
import { createAnalysisDriver } from '../../src/worker/analysisDriver';
import type { AnalysisWorkerLike } from '../../src/worker/analysisClient';

export class InProcessAnalysisWorker implements AnalysisWorkerLike {
  onmessage: ((event: MessageEvent<FromAnalysisWorker>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  onmessageerror: ((event: MessageEvent) => void) | null = null;
  sent: ToAnalysisWorker[] = [];
  terminated = false;
  private readonly driver = createAnalysisDriver(
    (message) => setTimeout(() => this.onmessage?.({ data: structuredClone(message) } as MessageEvent<FromAnalysisWorker>), 0),
    (resume) => setTimeout(resume, 0),
  );

  postMessage(message: ToAnalysisWorker): void {
    if (this.terminated) return;
    this.sent.push(message);
    const copy = structuredClone(message);
    setTimeout(() => this.driver.handle(copy), 0);
  }

  terminate(): void {
    this.terminated = true;
  }
}
