// The shape of an editor command: a registered plain object shared by menus, shortcuts, touch buttons and tests.
import type { DesignDocument } from '@/engine/schema';
import type { HistoryState } from '../history';
import type { EditorData, UiState } from '../store/types';

/** Enough of a keyboard event to test a shortcut against (no DOM types needed). */
export interface KeyLike {
  key: string;
  ctrlKey?: boolean;
  metaKey?: boolean;
  shiftKey?: boolean;
  altKey?: boolean;
}

export interface CommandResult {
  doc?: DesignDocument;
  ui?: Partial<UiState>;
  /** 'record' (default when doc changes), 'ignore', or a whole new history (undo/redo). */
  history?: 'record' | 'ignore' | HistoryState;
}

export interface Command<A = void> {
  id: string;
  label: string;
  /** True when it changes the design (hidden and refused for read-only roles). */
  edits: boolean;
  /** Shortcut test for desktop keyboards. */
  keyTest?: (e: KeyLike) => boolean;
  /** Shortcut text for tooltips. */
  keyHint?: string;
  predicate?: (s: EditorData, args: A) => boolean;
  perform: (s: EditorData, args: A) => CommandResult | null;
}

/** Declares a command with its argument type (identity; keeps inference in one place). */
export function defineCommand<A = void>(c: Command<A>): Command<A> {
  return c;
}

export const mod = (e: KeyLike) => Boolean(e.ctrlKey || e.metaKey);
