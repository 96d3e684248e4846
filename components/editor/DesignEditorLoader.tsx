'use client';
// Loads the editor in the browser only: Konva, the engine worker and local drafts have no server side.
import dynamic from 'next/dynamic';
import type { EditorProps } from './DesignEditor';

const DesignEditor = dynamic(() => import('./DesignEditor').then((m) => m.DesignEditor), {
  ssr: false,
  loading: () => (
    <div
      className="flex h-[60dvh] items-center justify-center text-ash-600"
      data-testid="editor-loading"
    >
      Opening the plan…
    </div>
  ),
});

export function DesignEditorLoader(props: EditorProps) {
  return <DesignEditor {...props} />;
}
