import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { z } from "zod";
import { getCurrentUser } from "@/app/_server/auth";
import { can, roleIn, type Actor } from "@/app/_server/authz";
import { NotebookEditorLoader } from "@/components/editor/notebook-editor-loader";
import { NotebookShell } from "@/components/notebook/notebook-shell";
import { getDb } from "@/db/client";
import { getGroupById } from "@/db/queries/groups";
import { getNotebookById } from "@/db/queries/notebooks";
import { getRolesForUser } from "@/db/queries/roles";

export const metadata: Metadata = { title: "Notebook" };

const notebookId = z.uuid();

/** Checks the session and the reader's role on the server, then hands plain props to the client editor. */
export default async function NotebookPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const user = await getCurrentUser();
  if (!user) redirect(`/sign-in?callbackUrl=/notebooks/${encodeURIComponent(id)}`);
  // A malformed id cannot name a notebook; answer "not found" before the database sees it.
  if (!notebookId.safeParse(id).success) notFound();

  const db = await getDb();
  const notebook = await getNotebookById({ db, id });
  if (!notebook) notFound();
  const actor: Actor = { id: user.id, roles: await getRolesForUser({ db, userId: user.id }) };
  const resource = { type: "notebook", groupId: notebook.groupId, notebookId: notebook.id } as const;
  // Another group's notebook answers like a missing one, so ids cannot be probed.
  if (!can(actor, "notebook:read", resource)) notFound();
  const role = roleIn(actor, notebook.groupId)!;
  const group = await getGroupById({ db, id: notebook.groupId });
  const readOnly = !can(actor, "notebook:edit", resource);

  return (
    <NotebookShell
      notebookId={notebook.id}
      title={notebook.title}
      groupId={notebook.groupId}
      groupName={group?.name ?? "its group"}
      role={role}
      readOnly={readOnly}
    >
      <NotebookEditorLoader
        notebookId={notebook.id}
        readOnly={readOnly}
        title={notebook.title}
        me={{ id: user.id, name: user.name, email: user.email }}
      />
    </NotebookShell>
  );
}
