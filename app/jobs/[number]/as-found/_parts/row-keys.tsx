'use client';

/**
 * Keys for the sheet's repeating rows (wires in hand, coils of a concentric group), while focus is in one
 * of those rows: Alt+Shift+A adds a row (focus moves to it), Alt+Shift+R removes the row with focus. Alt
 * with Shift is free in the browsers we support and does not type a character in a text field once
 * handled. The keys are matched by physical key (KeyboardEvent.code), so keyboard layouts that give
 * Alt+Shift+A another character still work.
 */
import type { KeyboardEvent } from 'react';

export const ROW_KEYS = {
  add: { code: 'KeyA', aria: 'Alt+Shift+A' },
  remove: { code: 'KeyR', aria: 'Alt+Shift+R' },
} as const;

export function rowKeyHandler({ add, remove }: { add: (() => void) | null; remove: ((row: number) => void) | null }) {
  return (e: KeyboardEvent<HTMLElement>) => {
    if (!e.altKey || !e.shiftKey || e.ctrlKey || e.metaKey) return;
    if (e.code === ROW_KEYS.add.code && add) {
      e.preventDefault();
      add();
    } else if (e.code === ROW_KEYS.remove.code && remove) {
      const row = e.target instanceof HTMLElement ? e.target.closest('tr[data-row]') : null;
      const index = row ? Number(row.getAttribute('data-row')) : NaN;
      if (!Number.isInteger(index)) return;
      e.preventDefault();
      remove(index);
    }
  };
}

/** The keys, written on the page beside the rows they work on. */
export function RowKeys({ id, what }: { id: string; what: string }) {
  return (
    <p id={id} className="hint row-keys">
      Keys in these rows: <kbd>Alt</kbd>+<kbd>Shift</kbd>+<kbd>A</kbd> adds {what}; <kbd>Alt</kbd>+<kbd>Shift</kbd>+<kbd>R</kbd> removes the
      row you are in.
    </p>
  );
}
