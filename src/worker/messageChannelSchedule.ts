/// <reference lib="webworker" />
/**
 * How a worker yields to its own event loop between slices of work: a message to itself through a
 * MessageChannel, which runs sooner than setTimeout's clamped delay yet lets incoming messages
 * (pause, stop, cancel) be heard within one slice. Shared by the run and analysis workers.
 */
export function messageChannelSchedule(): (resume: () => void) => void {
  const channel = new MessageChannel();
  let pending: (() => void) | undefined;
  channel.port1.onmessage = () => {
    const resume = pending;
    pending = undefined;
    resume?.();
  };
  return (resume) => {
    pending = resume;
    channel.port2.postMessage(null);
  };
}
