/**
 * A worker as the main-thread clients hold it (`Worker` or an in-process stand-in in tests), and
 * its start: created, its messages passed on, and its crashes and unreadable messages reported as
 * losses with a reason, so a client can drop it and start afresh with the next job.
 */
export interface WorkerLike<To, From> {
  postMessage(message: To): void;
  terminate(): void;
  onmessage: ((event: MessageEvent<From>) => void) | null;
  onerror: ((event: ErrorEvent) => void) | null;
  onmessageerror: ((event: MessageEvent) => void) | null;
}

/**
 * Creates the worker and wires it: `receive` gets each message's data, `lose` the worker and a
 * reason when it fails. Returns the worker, or the reason it could not be created (e.g. a browser
 * that refuses module workers). `name` says which worker in the reasons ("the analysis worker").
 */
export function startWatchedWorker<To, From>(
  create: () => WorkerLike<To, From>,
  name: string,
  receive: (data: From) => void,
  lose: (worker: WorkerLike<To, From>, reason: string) => void,
): WorkerLike<To, From> | { problem: string } {
  let worker: WorkerLike<To, From>;
  try {
    worker = create();
  } catch (error) {
    return { problem: error instanceof Error ? error.message : String(error) };
  }
  worker.onmessage = (event) => receive(event.data);
  worker.onerror = (event) => {
    event.preventDefault?.();
    lose(worker, event.message || `an error in ${name}`);
  };
  worker.onmessageerror = () => lose(worker, `a message from ${name} could not be read`);
  return worker;
}
