"use client";

import dynamic from "next/dynamic";

export interface NotebookEditorLoaderProps {
  notebookId: string;
  readOnly: boolean;
  title?: string;
  /** The signed-in user, named beside their caret for co-authors. */
  me: { id: string; name: string; email: string };
}

// The editor touches `window` (ProseMirror view, KaTeX measuring, the check worker),
// so it is never rendered on the server.
const NotebookEditor = dynamic(() => import("./notebook-editor").then((m) => m.NotebookEditor), {
  ssr: false,
  loading: () => (
    <div role="status" className="mx-auto max-w-3xl px-6 py-12 text-sm text-stone-500">
      Opening the notebook…
    </div>
  ),
});

/** Mounts the notebook editor on the client only. */
export function NotebookEditorLoader(props: NotebookEditorLoaderProps) {
  return <NotebookEditor {...props} />;
}
