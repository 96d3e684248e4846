'use client';
// Holds one editor store per mounted editor (in a ref) and hands narrow selectors to components.
import { createContext, useContext, useState, type ReactNode } from 'react';
import { useStore } from 'zustand';
import {
  createEditorStore,
  type EditorInit,
  type EditorState,
  type EditorStore,
} from './createEditorStore';

const EditorContext = createContext<EditorStore | null>(null);

export function EditorStoreProvider({
  init,
  children,
}: {
  init: () => EditorInit;
  children: ReactNode;
}) {
  // useState's initialiser runs once per mount: one store per editor instance.
  const [store] = useState(() => createEditorStore(init()));
  return <EditorContext.Provider value={store}>{children}</EditorContext.Provider>;
}

/** The editor store itself (for commands and subscriptions outside render). */
export function useEditorStore(): EditorStore {
  const store = useContext(EditorContext);
  if (!store) throw new Error('useEditorStore must be used inside EditorStoreProvider');
  return store;
}

/** A narrow slice of editor state; the component re-renders only when the slice changes. */
export function useEditor<T>(selector: (s: EditorState) => T): T {
  return useStore(useEditorStore(), selector);
}
