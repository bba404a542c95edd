"use client";

import type { NotebookEditorLoaderProps } from "./notebook-editor-loader";

/** The notebook editor (being built; see editor/INTERNALS.md). */
export function NotebookEditor({ title }: NotebookEditorLoaderProps) {
  return (
    <div className="mx-auto max-w-3xl px-6 py-12 font-serif">
      {title ? <h1 className="text-2xl">{title}</h1> : null}
    </div>
  );
}
