// @vitest-environment jsdom
import { afterEach, describe, expect, it, vi } from 'vitest';
import { act, cleanup, fireEvent, render, screen } from '@testing-library/react';
import { useUpdateStore } from '../../src/pwa/updateStore';
import { UpdateNotice } from '../../src/ui/UpdateNotice';
import { resetStores } from '../helpers/resetStores';

afterEach(() => {
  cleanup();
  resetStores();
});

describe('update notice', () => {
  it('shows nothing until a new version is waiting', () => {
    const { container } = render(<UpdateNotice />);
    expect(container.textContent).toBe('');
  });

  it('offers the waiting version and reloads only when the user presses Reload', () => {
    const apply = vi.fn(async () => undefined);
    render(<UpdateNotice />);
    act(() => useUpdateStore.getState().offerUpdate(apply));
    const notice = screen.getByRole('status');
    expect(notice.textContent).toContain('A new version is ready — Reload when convenient.');
    expect(apply).not.toHaveBeenCalled();
    fireEvent.click(screen.getByRole('button', { name: 'Reload' }));
    expect(apply).toHaveBeenCalledTimes(1);
  });

  it('can be put off without reloading', () => {
    const apply = vi.fn(async () => undefined);
    useUpdateStore.getState().offerUpdate(apply);
    render(<UpdateNotice />);
    fireEvent.click(screen.getByRole('button', { name: 'Later' }));
    expect(screen.queryByRole('status')).toBeNull();
    expect(apply).not.toHaveBeenCalled();
  });
});
