/**
 * The real steady-glacier preview driver behind the PreviewWorkerLike interface, in the test
 * process: messages go through structuredClone both ways (as postMessage copies them) and slices
 * run on timers, so component tests exercise the path from an edit to the text on screen.
 */
import type { PreviewWorkerLike } from '../../src/worker/steadyPreviewClient';
import { createPreviewDriver } from '../../src/worker/steadyPreviewDriver';
import type { FromPreviewWorker, ToPreviewWorker } from '../../src/worker/steadyPreviewProtocol';

export class InProcessPreviewWorker implements PreviewWorkerLike {
  onmessage: ((event: MessageEvent<FromPreviewWorker>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  onmessageerror: ((event: MessageEvent) => void) | null = null;
  sent: ToPreviewWorker[] = [];
  terminated = false;
  private readonly driver = createPreviewDriver(
    (message) => setTimeout(() => this.onmessage?.({ data: structuredClone(message) } as MessageEvent<FromPreviewWorker>), 0),
    (resume) => setTimeout(resume, 0),
  );

  postMessage(message: ToPreviewWorker): void {
    if (this.terminated) return;
    this.sent.push(message);
    const copy = structuredClone(message);
    setTimeout(() => this.driver.handle(copy), 0);
  }

  terminate(): void {
    this.terminated = true;
  }
}
