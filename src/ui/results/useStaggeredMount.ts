/**
 * True `delay` animation frames after `ready` turns true. Views mounted together at the first
 * frame of a run would make one long task; mounting the secondary ones a frame or two later
 * spreads that work over several short ones. The mount is a transition, so React renders it in
 * interruptible slices rather than one task.
 */
import { startTransition, useEffect, useState } from 'react';

export function useStaggeredMount(ready: boolean, delay = 1): boolean {
  const [mounted, setMounted] = useState(ready);
  useEffect(() => {
    if (!ready) {
      setMounted(false);
      return undefined;
    }
    let left = delay;
    let handle = 0;
    const tick = () => {
      if (--left <= 0) startTransition(() => setMounted(true));
      else handle = requestAnimationFrame(tick);
    };
    handle = requestAnimationFrame(tick);
    return () => cancelAnimationFrame(handle);
  }, [ready, delay]);
  return ready && mounted;
}
