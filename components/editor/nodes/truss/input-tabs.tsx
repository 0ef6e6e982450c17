"use client";

import { useId, useRef, type KeyboardEvent, type ReactNode } from "react";

export type InputTab<T extends string> = { id: T; label: string; /** Problems in the tab, shown as a count in words. */ problems?: number; content: ReactNode };

export type InputTabsProps<T extends string> = {
  tabs: readonly InputTab<T>[];
  active: T;
  onSelect: (id: T) => void;
  /** What the tabs hold, for screen readers: "Inputs of T1". */
  label: string;
};

/**
 * Tabs for a calc's input tables, so a large truss does not push its
 * results off the page. Arrow keys move between tabs (the WAI-ARIA tabs
 * pattern); a tab with problems says how many, in words and with a mark.
 */
export function InputTabs<T extends string>({ tabs, active, onSelect, label }: InputTabsProps<T>) {
  const id = useId();
  const listRef = useRef<HTMLDivElement>(null);
  const current = tabs.find((t) => t.id === active) ?? tabs[0];
  const onKeyDown = (e: KeyboardEvent<HTMLButtonElement>, index: number) => {
    const step = e.key === "ArrowRight" ? 1 : e.key === "ArrowLeft" ? -1 : 0;
    const to = e.key === "Home" ? 0 : e.key === "End" ? tabs.length - 1 : step === 0 ? -1 : (index + step + tabs.length) % tabs.length;
    if (to < 0) return;
    e.preventDefault();
    onSelect(tabs[to].id);
    listRef.current?.querySelectorAll<HTMLButtonElement>('[role="tab"]')[to]?.focus();
  };
  return (
    <div>
      <div ref={listRef} role="tablist" aria-label={label} className="flex flex-wrap gap-x-1 border-b border-rule">
        {tabs.map((t, i) => {
          const selected = t.id === current.id;
          return (
            <button
              key={t.id}
              type="button"
              role="tab"
              id={`${id}-tab-${t.id}`}
              aria-selected={selected}
              aria-controls={`${id}-panel`}
              tabIndex={selected ? 0 : -1}
              className={`-mb-px border-b-2 px-2.5 py-1 text-sm ${selected ? "border-ink font-medium text-ink" : "border-transparent text-ink-soft hover:text-ink"}`}
              onClick={() => onSelect(t.id)}
              onKeyDown={(e) => onKeyDown(e, i)}
            >
              {t.label}
              {t.problems ? <span className="ml-1.5 text-xs text-compression">{`✕ ${t.problems} ${t.problems === 1 ? "problem" : "problems"}`}</span> : null}
            </button>
          );
        })}
      </div>
      <div role="tabpanel" id={`${id}-panel`} aria-labelledby={`${id}-tab-${current.id}`} className="pt-3" data-tab={current.id}>
        {current.content}
      </div>
    </div>
  );
}
