/**
 * A real worker driver behind the WorkerLike interface, in the test process: messages go through
 * structuredClone both ways (as postMessage copies them) and slices run on timers, so component
 * tests exercise the whole path from a click or an edit to the result on screen without a browser.
 */
import type { WorkerLike } from '../../src/worker/watchedWorker';

type DriverFactory<To, From> = (post: (message: From) => void, schedule: (resume: () => void) => void) => { handle(message: To): void };

export class InProcessWorker<To, From> implements WorkerLike<To, From> {
  onmessage: ((event: MessageEvent<From>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  onmessageerror: ((event: MessageEvent) => void) | null = null;
  sent: To[] = [];
  terminated = false;
  private readonly driver: { handle(message: To): void };

  constructor(createDriver: DriverFactory<To, From>) {
    this.driver = createDriver(
      (message) => setTimeout(() => this.onmessage?.({ data: structuredClone(message) } as MessageEvent<From>), 0),
      (resume) => setTimeout(resume, 0),
    );
  }

  postMessage(message: To): void {
    if (this.terminated) return;
    this.sent.push(message);
    const copy = structuredClone(message);
    setTimeout(() => this.driver.handle(copy), 0);
  }

  terminate(): void {
    this.terminated = true;
  }
}
