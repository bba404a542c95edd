import Link from "next/link";
import type { ReactNode } from "react";
import { roleArticle, roleLabel } from "@/components/data/roles";
import type { Role } from "@/components/data/roles";
import { NotebookRecords } from "./notebook-records";
import { NotebookTitle } from "./notebook-title";

export type NotebookShellProps = {
  notebookId: string;
  title: string;
  groupId: string;
  groupName: string;
  role: Role;
  readOnly: boolean;
  children: ReactNode;
};

/** The frame around the editor: where the notebook belongs, who you are in it, and whether you may change it. */
export function NotebookShell({ notebookId, title, groupId, groupName, role, readOnly, children }: NotebookShellProps) {
  return (
    <div className="mx-auto max-w-6xl px-6 py-8">
      <nav aria-label="Breadcrumb" className="mb-3 text-sm">
        <ol className="flex flex-wrap gap-1 text-ink-soft">
          <li>
            <Link href="/dashboard">Dashboard</Link>
            <span aria-hidden="true"> / </span>
          </li>
          <li>
            <Link href={`/groups/${groupId}`}>{groupName}</Link>
          </li>
        </ol>
      </nav>
      <header className="mb-6 border-b border-paper-edge pb-4">
        <NotebookTitle notebookId={notebookId} title={title} canRename={!readOnly} />
        <p className="mt-2 flex flex-wrap items-center gap-2 text-sm text-ink-soft">
          <span>
            You are {roleArticle(role)} <strong>{roleLabel(role)}</strong> in {groupName}.
          </span>
          {readOnly && (
            <span className="inline-flex items-center gap-1 rounded-full border border-paper-edge bg-paper-deep px-2 py-0.5 text-xs font-medium text-ink">
              <span aria-hidden="true">◇</span>
              <span>Read-only</span>
            </span>
          )}
        </p>
      </header>
      {children}
      <NotebookRecords notebookId={notebookId} role={role} readOnly={readOnly} />
    </div>
  );
}
