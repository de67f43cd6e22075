/**
 * Whether an element is at least partly in the viewport (IntersectionObserver). Where the
 * browser has none (test environments), it counts as on screen.
 */
import { useEffect, useState, type RefObject } from 'react';

export function useOnScreen(ref: RefObject<Element | null>): boolean {
  const [onScreen, setOnScreen] = useState(typeof IntersectionObserver === 'undefined');
  useEffect(() => {
    const element = ref.current;
    if (!element || typeof IntersectionObserver === 'undefined') return undefined;
    const observer = new IntersectionObserver((entries) => setOnScreen(entries.some((e) => e.isIntersecting)));
    observer.observe(element);
    return () => observer.disconnect();
  }, [ref]);
  return onScreen;
}
