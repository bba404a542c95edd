"use client";

import { AttachmentSection } from "@/components/attachments/attachment-section";
import { CheckpointSection } from "@/components/checkpoints/checkpoint-section";
import { EditionSection } from "@/components/editions/edition-section";
import type { Role } from "@/components/data/roles";
import { buttonClasses } from "@/components/ui/button";

/** Below the text: the notebook's history, publications, files and its LaTeX download. */
export function NotebookRecords({ notebookId, role, readOnly }: { notebookId: string; role: Role; readOnly: boolean }) {
  return (
    <aside aria-label="History, editions and files" className="mt-10 grid gap-8 border-t border-paper-edge pt-6 lg:grid-cols-2">
      <div className="space-y-8">
        <CheckpointSection notebookId={notebookId} canWrite={!readOnly} />
      </div>
      <div className="space-y-8">
        <EditionSection notebookId={notebookId} canPublish={role === "lead"} />
        <section aria-label="LaTeX" className="space-y-2">
          <h2 className="font-serif text-xl font-semibold">LaTeX</h2>
          <p className="text-sm text-ink-soft">The current text as an amsmath article for pdflatex, steps as numbered equations with their justifications; remarks stay out. With figures it comes as a zip.</p>
          <a className={buttonClasses("quiet")} href={`/api/notebooks/${notebookId}/export?format=tex`} download>
            Download as LaTeX
          </a>
        </section>
        <AttachmentSection notebookId={notebookId} canWrite={!readOnly} />
      </div>
    </aside>
  );
}
