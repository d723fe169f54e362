import { useId, useRef, type KeyboardEvent, type ReactNode } from 'react';

export interface TabItem<T extends string> {
  id: T;
  label: ReactNode;
}

interface TabsProps<T extends string> {
  label: string;
  tabs: readonly TabItem<T>[];
  selected: T;
  onSelect(id: T): void;
  /** The panel the tabs control (rendered by the caller with tabPanelProps). */
  panelId: string;
  tone?: 'ember' | 'ink';
  className?: string;
}

const keys: Record<string, (i: number, n: number) => number> = {
  ArrowRight: (i, n) => (i + 1) % n,
  ArrowDown: (i, n) => (i + 1) % n,
  ArrowLeft: (i, n) => (i - 1 + n) % n,
  ArrowUp: (i, n) => (i - 1 + n) % n,
  Home: () => 0,
  End: (_, n) => n - 1,
};

/** The id of the tab button for an item, so the panel can name the tab that labels it. */
export const tabId = (panelId: string, id: string) => `${panelId}-tab-${id}`;

/**
 * A tab list by the WAI-ARIA tabs pattern: one tab in the Tab order (the selected one), arrow
 * keys and Home/End move and select (automatic activation), each tab controls the one panel.
 */
export function Tabs<T extends string>({ label, tabs, selected, onSelect, panelId, tone = 'ember', className = '' }: TabsProps<T>) {
  const list = useRef<HTMLDivElement>(null);
  const on = tone === 'ember' ? 'bg-ember-600 text-white' : 'bg-ink text-white';
  function onKeyDown(event: KeyboardEvent<HTMLDivElement>) {
    const move = keys[event.key];
    const index = tabs.findIndex((t) => t.id === selected);
    if (!move || index < 0) return;
    event.preventDefault();
    const next = tabs[move(index, tabs.length)]!;
    onSelect(next.id);
    list.current?.querySelector<HTMLButtonElement>(`#${CSS.escape(tabId(panelId, next.id))}`)?.focus();
  }
  return (
    <div ref={list} role="tablist" aria-label={label} onKeyDown={onKeyDown} className={`flex flex-wrap gap-1 ${className}`}>
      {tabs.map((tab) => {
        const active = tab.id === selected;
        return (
          <button
            key={tab.id}
            id={tabId(panelId, tab.id)}
            role="tab"
            type="button"
            aria-selected={active}
            aria-controls={panelId}
            tabIndex={active ? 0 : -1}
            onClick={() => onSelect(tab.id)}
            className={`min-h-9 rounded-md px-2 py-1.5 text-xs sm:px-3 sm:text-sm ${active ? on : 'border border-rule bg-white'}`}
          >
            {tab.label}
          </button>
        );
      })}
    </div>
  );
}

/** A DOM-safe id for the panel a tab list controls. */
export function useTabPanel(): string {
  return useId().replace(/:/g, '');
}

export const tabPanelProps = (panelId: string, selected: string) => ({ id: panelId, role: 'tabpanel', 'aria-labelledby': tabId(panelId, selected), tabIndex: -1 });
