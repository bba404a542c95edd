// GET /api/notebooks/:id/export?format=tex[&edition=N]
//   current document: any member; an edition: anyone (editions are public)
//   → 200 the .tex (application/x-tex) or, when figures are placed, a .zip of the .tex and figures/,
//     with Content-Disposition: attachment; filename="<title>[-edition-N].tex|zip"
//   → 400 bad_request:query, 401 unauthorized:session, 403 forbidden:notebook, 404 not_found:notebook | not_found:edition
import type { JSONContent } from "@tiptap/core";
import { getDb } from "@/db/client";
import { getEditionByNumber } from "@/db/queries/editions";
import { getGroupById } from "@/db/queries/groups";
import { getCurrentUser } from "@/app/_server/auth";
import { readNotebookDocument } from "@/app/_server/collab/documents";
import type { LedgerEntry } from "@/app/_server/editions/ledger";
import { findNotebook } from "@/app/_server/editions/notebook-lookup";
import { AppError, handleRoute } from "@/app/_server/errors";
import { buildTexDownload } from "@/app/_server/export/notebook-tex";
import { authorize, loadActor, requireUser } from "@/app/_server/guard";
import { parseParams, parseSearchParams } from "@/app/_server/parse";
import { exportParams, exportQuery } from "./schema";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";

type Params = { id: string };

export const GET = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, exportParams);
  const query = parseSearchParams(request, exportQuery);
  const db = await getDb();
  const { notebook, resource } = await findNotebook(db, id);
  const group = await getGroupById({ db, id: notebook.groupId });
  const author = group?.name ?? "";

  let download;
  if (query.edition !== undefined) {
    await authorize({ db, actor: await loadActor({ db, user: await getCurrentUser() }), action: "edition:read", resource, request });
    const edition = await getEditionByNumber({ db, notebookId: notebook.id, number: query.edition });
    if (!edition) throw new AppError("not_found:edition", `This notebook has no edition ${query.edition}.`);
    download = await buildTexDownload({
      db,
      notebookId: notebook.id,
      title: edition.title,
      author,
      content: edition.content as JSONContent,
      edition: { number: edition.number, sha256: edition.sha256, publishedAt: edition.publishedAt, ledger: edition.ledger as LedgerEntry[] },
    });
  } else {
    const user = await requireUser();
    await authorize({ db, actor: await loadActor({ db, user }), action: "notebook:export", resource, request });
    const document = await readNotebookDocument({ db, notebookId: notebook.id });
    if (!document) throw new AppError("not_found:notebook", "No notebook with that id.");
    download = await buildTexDownload({ db, notebookId: notebook.id, title: notebook.title, author, content: document.json as JSONContent });
  }
  return new Response(Buffer.from(download.body), {
    headers: {
      "Content-Type": download.contentType,
      "Content-Disposition": `attachment; filename="${download.fileName}"`,
      "X-Content-Type-Options": "nosniff",
      "Cache-Control": "no-store",
    },
  });
});
