// GET /api/notebooks/:id/editions (public, like every edition; 404 to non-members while there are none)
//   → 200 {"editions": [{"number", "title", "sha256", "reason", "publishedByName", "publishedAt", "tally": {verdict: count}, "url"}]}
// POST /api/notebooks/:id/editions {"reason"?: string} (group lead only)
//   re-runs every check in the worker pool, stores the check ledger and freezes the document
//   → 201 {"number", "sha256", "ledger": [{"number", "id", "relation", "justification": {"kind", "detail", "cites", "follows"},
//          "verdict": "verified"|"refuted"|"undecided", "method", "witness"?, "reason"?}], "url"}
//   → 409 conflict:refuted {"error", "refuted": [ledger entries]} while a step is refuted and no reason is given
//   → 400 bad_request:*, 401 unauthorized:session, 403 forbidden:notebook, 404 not_found:notebook
import { getDb } from "@/db/client";
import { listEditions } from "@/db/queries/editions";
import { can } from "@/app/_server/authz";
import { citationKey, editionPath, siteOrigin } from "@/app/_server/editions/citation";
import { findNotebook } from "@/app/_server/editions/notebook-lookup";
import { publishEdition } from "@/app/_server/editions/publish";
import { AppError, handleRoute } from "@/app/_server/errors";
import { admitToNotebook, auditChange, authorize, loadActor } from "@/app/_server/guard";
import { sendEditionPublishedMail } from "@/app/_server/mail";
import { getCurrentUser } from "@/app/_server/auth";
import { parseJsonBody, parseParams } from "@/app/_server/parse";
import { editionsParams, publishEditionBody } from "./schema";

export const dynamic = "force-dynamic";

type Params = { id: string };

export const GET = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, editionsParams);
  const db = await getDb();
  const { notebook, resource } = await findNotebook(db, id);
  const actor = await loadActor({ db, user: await getCurrentUser() });
  await authorize({ db, actor, action: "edition:read", resource, request });
  const editions = await listEditions({ db, notebookId: notebook.id });
  // Nothing published yet: to outsiders the notebook stays as invisible as any other.
  if (editions.length === 0 && !can(actor, "notebook:read", resource)) throw new AppError("not_found:notebook", "No notebook with that id.");
  const origin = siteOrigin();
  return Response.json({
    editions: editions.map(({ id: _id, publishedBy: _by, ...edition }) => ({
      ...edition,
      key: citationKey(notebook.id, edition.number),
      url: `${origin}${editionPath(notebook.id, edition.number)}`,
    })),
  });
});

export const POST = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, editionsParams);
  const body = await parseJsonBody(request, publishEditionBody);
  const { db, user, actor, notebook } = await admitToNotebook({ notebookId: id, action: "notebook:publish", request });
  const outcome = await publishEdition({ db, notebook, publishedBy: user.id, reason: body.reason || null });
  if ("refused" in outcome) {
    const numbers = outcome.refuted.map((entry) => entry.number).join(", ");
    return Response.json(
      {
        error: {
          code: "conflict:refuted",
          message: `The checker refutes step${outcome.refuted.length > 1 ? "s" : ""} ${numbers}. Fix ${outcome.refuted.length > 1 ? "them" : "it"}, or publish with a reason that says why the edition stands as it is.`,
        },
        refuted: outcome.refuted,
      },
      { status: 409 },
    );
  }
  const { published, ledger } = outcome;
  await auditChange({ db, actor, action: "notebook:publish", resourceType: "notebook", resourceId: notebook.id, detail: { number: published.number, sha256: published.sha256, reason: published.reason }, request });
  // The edition is stored and frozen; a mail that fails to go out must not undo that.
  await sendEditionPublishedMail({ db, notebookId: notebook.id, number: published.number, publishedBy: user.id, permalink: `${siteOrigin()}${editionPath(notebook.id, published.number)}` }).catch(
    (error: unknown) => console.error("[editions] could not send the edition-published mail", error),
  );
  return Response.json(
    { number: published.number, sha256: published.sha256, ledger, url: `${siteOrigin()}${editionPath(notebook.id, published.number)}` },
    { status: 201 },
  );
});
