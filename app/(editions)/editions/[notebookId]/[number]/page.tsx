import "katex/dist/katex.min.css";
import type { JSONContent } from "@tiptap/core";
import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { z } from "zod";
import { bibtexForEdition, citationKey, editionPath, siteOrigin } from "@/app/_server/editions/citation";
import { EditionContent } from "@/components/editions/edition-content";
import { LedgerTable } from "@/components/editions/ledger-table";
import { buttonClasses } from "@/components/ui/button";
import { getDb } from "@/db/client";
import { getEditionByNumber } from "@/db/queries/editions";
import { getGroupById } from "@/db/queries/groups";
import { getNotebookById } from "@/db/queries/notebooks";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Edition" };

const params = z.object({ notebookId: z.uuid(), number: z.coerce.number().int().min(1).max(1_000_000) });

/** The permanent, read-only page of an edition. Editions are public: no session is needed (authz: edition:read). */
export default async function EditionPage({ params: raw }: { params: Promise<{ notebookId: string; number: string }> }) {
  const parsed = params.safeParse(await raw);
  if (!parsed.success) notFound();
  const { notebookId, number } = parsed.data;
  const db = await getDb();
  const notebook = await getNotebookById({ db, id: notebookId });
  if (!notebook) notFound();
  const edition = await getEditionByNumber({ db, notebookId, number });
  if (!edition) notFound();
  const group = await getGroupById({ db, id: notebook.groupId });
  const url = `${siteOrigin()}${editionPath(notebookId, number)}`;
  const ledger = edition.ledger as Parameters<typeof LedgerTable>[0]["ledger"];
  const bibtex = bibtexForEdition({ key: citationKey(notebookId, number), title: edition.title, groupName: group?.name ?? "Vierbein", number, publishedAt: edition.publishedAt, url, sha256: edition.sha256 });

  return (
    <article className="mx-auto max-w-4xl space-y-8 px-6 py-8">
      <header className="space-y-2 border-b border-paper-edge pb-4">
        <p className="text-sm text-ink-soft">
          {group?.name} · Edition {edition.number} · published {edition.publishedAt.toISOString().slice(0, 10)}
          {edition.publishedByName ? ` by ${edition.publishedByName}` : ""}
        </p>
        <h1 className="font-serif text-3xl font-semibold tracking-tight">{edition.title}</h1>
        <p className="text-sm">
          Frozen: this text and its check ledger never change. Permanent link: <a href={url}>{url}</a>
        </p>
        <p className="break-all text-xs text-ink-soft">SHA-256 of the canonical edition: <code>{edition.sha256}</code></p>
        {edition.reason && (
          <p className="rounded-md border border-alarm bg-alarm-wash p-2 text-sm">
            <strong>Published with refuted steps.</strong> The group lead’s reason: {edition.reason}
          </p>
        )}
        <a className={buttonClasses("quiet")} href={`/api/notebooks/${notebookId}/export?format=tex&edition=${number}`} download>
          Download as LaTeX
        </a>
      </header>

      <EditionContent content={edition.content as JSONContent} ledger={ledger} />

      <section aria-labelledby="ledger-title" className="space-y-2">
        <h2 id="ledger-title" className="font-serif text-xl font-semibold">Check ledger</h2>
        <p className="text-xs text-ink-soft">Every step was re-checked on the server at publication. A numeric “verified” is probabilistic: the two sides agreed at random points, which is strong evidence but not a proof.</p>
        <LedgerTable ledger={ledger} />
      </section>

      <section aria-labelledby="cite-title" className="space-y-2">
        <h2 id="cite-title" className="font-serif text-xl font-semibold">Cite this edition</h2>
        <pre aria-label="BibTeX entry" className="overflow-x-auto rounded-md border border-paper-edge bg-white/60 p-3 text-xs">{bibtex}</pre>
      </section>
    </article>
  );
}
