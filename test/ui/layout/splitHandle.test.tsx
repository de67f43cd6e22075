// @vitest-environment jsdom
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { useRef } from 'react';
import { SplitHandle, useViewsShare, VIEWS_SHARE } from '../../../src/ui/layout/SplitHandle';

function Harness() {
  const box = useRef<HTMLDivElement>(null);
  const [share, setShare] = useViewsShare(box);
  return (
    <div ref={box} data-testid="box">
      <SplitHandle share={share} onShare={setShare} container={box} controls="views" />
      <section id="views" />
    </div>
  );
}

beforeEach(() => localStorage.clear());
afterEach(cleanup);

describe('SplitHandle', () => {
  it('is a focusable separator whose arrow keys, Page keys, Home and End set the views’ share within its limits', () => {
    render(<Harness />);
    const handle = screen.getByRole('separator', { name: 'Height of the results and tools' });
    const box = screen.getByTestId('box');
    expect(handle.tabIndex).toBe(0);
    expect(handle.getAttribute('aria-valuenow')).toBe(String(VIEWS_SHARE.initial));
    expect(box.style.getPropertyValue('--views-share')).toBe(`${VIEWS_SHARE.initial}%`);

    fireEvent.keyDown(handle, { key: 'ArrowUp' });
    expect(handle.getAttribute('aria-valuenow')).toBe(String(VIEWS_SHARE.initial + VIEWS_SHARE.step));
    fireEvent.keyDown(handle, { key: 'PageDown' });
    expect(handle.getAttribute('aria-valuenow')).toBe(String(VIEWS_SHARE.initial + VIEWS_SHARE.step - VIEWS_SHARE.pageStep));
    fireEvent.keyDown(handle, { key: 'End' });
    expect(handle.getAttribute('aria-valuenow')).toBe(String(VIEWS_SHARE.max));
    fireEvent.keyDown(handle, { key: 'ArrowUp' });
    expect(handle.getAttribute('aria-valuenow')).toBe(String(VIEWS_SHARE.max));
    fireEvent.keyDown(handle, { key: 'Home' });
    expect(handle.getAttribute('aria-valuenow')).toBe(String(VIEWS_SHARE.min));
    expect(box.style.getPropertyValue('--views-share')).toBe(`${VIEWS_SHARE.min}%`);
  });

  it('keeps the share for the next visit, and ignores a stored value it cannot use', () => {
    const first = render(<Harness />);
    fireEvent.keyDown(screen.getByRole('separator'), { key: 'PageUp' });
    first.unmount();
    render(<Harness />);
    expect(screen.getByRole('separator').getAttribute('aria-valuenow')).toBe(String(VIEWS_SHARE.initial + VIEWS_SHARE.pageStep));
    cleanup();

    localStorage.setItem('firnline.viewsShare', 'tall');
    render(<Harness />);
    expect(screen.getByRole('separator').getAttribute('aria-valuenow')).toBe(String(VIEWS_SHARE.initial));
  });
});
