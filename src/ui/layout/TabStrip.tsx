/**
 * A row of tabs after the WAI-ARIA tabs pattern (https://www.w3.org/WAI/ARIA/apg/patterns/tabs/):
 * one tab in the Tab order, arrow keys, Home and End move between tabs and select them. The
 * caller renders the panels, with `tabPanelProps` giving each its id and label.
 */
import type { KeyboardEvent, ReactNode } from 'react';

export interface TabSpec<K extends string> {
  key: K;
  label: ReactNode;
}

export const tabId = (idBase: string, key: string) => `${idBase}-tab-${key}`;
export const panelId = (idBase: string, key: string) => `${idBase}-panel-${key}`;

/** Props of the panel for `key`: kept mounted and hidden when not selected, so inputs survive. */
export function tabPanelProps(idBase: string, key: string, selected: string) {
  return { role: 'tabpanel', id: panelId(idBase, key), 'aria-labelledby': tabId(idBase, key), hidden: key !== selected } as const;
}

export function TabStrip<K extends string>({
  tabs,
  selected,
  onSelect,
  idBase,
  label,
  className = 'tabs',
}: {
  tabs: readonly TabSpec<K>[];
  selected: K;
  onSelect: (key: K) => void;
  idBase: string;
  label: string;
  className?: string;
}) {
  function onKey(event: KeyboardEvent<HTMLButtonElement>) {
    const i = tabs.findIndex((t) => t.key === selected);
    const n = tabs.length;
    const j =
      event.key === 'ArrowRight' ? (i + 1) % n
      : event.key === 'ArrowLeft' ? (i + n - 1) % n
      : event.key === 'Home' ? 0
      : event.key === 'End' ? n - 1
      : -1;
    if (j < 0) return;
    event.preventDefault();
    onSelect(tabs[j].key);
    document.getElementById(tabId(idBase, tabs[j].key))?.focus();
  }

  return (
    <div role="tablist" aria-label={label} className={className}>
      {tabs.map((t) => (
        <button
          key={t.key}
          id={tabId(idBase, t.key)}
          type="button"
          role="tab"
          aria-selected={selected === t.key}
          aria-controls={panelId(idBase, t.key)}
          tabIndex={selected === t.key ? 0 : -1}
          onClick={() => onSelect(t.key)}
          onKeyDown={onKey}
        >
          {t.label}
        </button>
      ))}
    </div>
  );
}
