"use client";

import { useState } from "react";
import { useGroups } from "@/components/data/queries";
import { canWriteNotebooks } from "@/components/data/roles";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { PageHeading } from "@/components/ui/page-heading";
import { Panel } from "@/components/ui/panel";
import { GroupList } from "./group-list";
import { NewGroupForm } from "./new-group-form";
import { NewNotebookForm } from "./new-notebook-form";
import { NotebooksTable } from "./notebooks-table";

export function DashboardView({ userName }: { userName: string }) {
  const groups = useGroups();
  const [composing, setComposing] = useState(false);
  const writableGroups = (groups.data ?? []).filter((group) => canWriteNotebooks(group.role));

  return (
    <div className="mx-auto max-w-6xl px-6 py-10">
      <PageHeading
        title="Dashboard"
        lead={`Welcome back, ${userName}.`}
        actions={
          writableGroups.length > 0 && !composing ? <Button onClick={() => setComposing(true)}>New notebook</Button> : undefined
        }
      />
      <div className="grid gap-8 lg:grid-cols-[1fr_18rem]">
        <section aria-labelledby="notebooks-title" className="min-w-0 space-y-4">
          <h2 id="notebooks-title" className="font-serif text-xl font-semibold">
            Notebooks
          </h2>
          {composing && <NewNotebookForm groups={writableGroups} onCancel={() => setComposing(false)} />}
          {groups.isSuccess && groups.data.length > 0 && writableGroups.length === 0 && (
            <Notice kind="info">
              Your roles in your groups do not include writing. To start a notebook you need the author role; ask your group lead, or start a group of your own.
            </Notice>
          )}
          <NotebooksTable />
        </section>
        <aside className="space-y-6">
          <Panel title="Your groups" id="groups-title">
            {groups.isPending && <p role="status">Loading groups…</p>}
            {groups.isError && <Notice kind="problem">{groups.error.message}</Notice>}
            {groups.isSuccess && <GroupList groups={groups.data} />}
          </Panel>
          <Panel title="Start a group" id="new-group-title">
            <NewGroupForm />
          </Panel>
        </aside>
      </div>
    </div>
  );
}
