// GET /api/notebooks/:id/editions/:number (public: editions are citable, signed in or not)
//   → 200 {"edition": {"notebookId", "number", "title", "content" (frozen Tiptap JSON), "ledger", "sha256", "reason",
//          "publishedByName", "publishedAt", "url", "bibtex"}}
//     sha256 is over the canonical serialisation described in app/_server/editions/canonical.ts
// PATCH, PUT, DELETE → 405 method_not_allowed:edition (editions never change; the database refuses too)
//   → 400 bad_request:params, 404 not_found:notebook | not_found:edition
import { getDb } from "@/db/client";
import { getGroupById } from "@/db/queries/groups";
import { getEditionByNumber } from "@/db/queries/editions";
import { getCurrentUser } from "@/app/_server/auth";
import { bibtexForEdition, citationKey, editionPath, siteOrigin } from "@/app/_server/editions/citation";
import { findNotebook } from "@/app/_server/editions/notebook-lookup";
import { AppError, handleRoute } from "@/app/_server/errors";
import { authorize, loadActor } from "@/app/_server/guard";
import { parseParams } from "@/app/_server/parse";
import { editionParams } from "../schema";

export const dynamic = "force-dynamic";

type Params = { id: string; number: string };

export const GET = handleRoute<Params>(async (request, { params }) => {
  const { id, number } = await parseParams(params, editionParams);
  const db = await getDb();
  const { notebook, resource } = await findNotebook(db, id);
  await authorize({ db, actor: await loadActor({ db, user: await getCurrentUser() }), action: "edition:read", resource, request });
  const edition = await getEditionByNumber({ db, notebookId: notebook.id, number });
  if (!edition) throw new AppError("not_found:edition", `This notebook has no edition ${number}.`);
  const group = await getGroupById({ db, id: notebook.groupId });
  const url = `${siteOrigin()}${editionPath(notebook.id, number)}`;
  return Response.json({
    edition: {
      notebookId: notebook.id,
      number: edition.number,
      title: edition.title,
      content: edition.content,
      ledger: edition.ledger,
      sha256: edition.sha256,
      reason: edition.reason,
      publishedByName: edition.publishedByName,
      publishedAt: edition.publishedAt,
      url,
      bibtex: bibtexForEdition({
        key: citationKey(notebook.id, number),
        title: edition.title,
        groupName: group?.name ?? "Vierbein",
        number,
        publishedAt: edition.publishedAt,
        url,
        sha256: edition.sha256,
      }),
    },
  });
});

const frozen = handleRoute<Params>(async () => {
  throw new AppError("method_not_allowed:edition", "Editions are frozen: they cannot be changed or deleted. Publish a new edition instead.");
});

const withAllow = (handler: typeof frozen) => async (request: Request, context: { params: Promise<Params> }) => {
  const response = await handler(request, context);
  response.headers.set("Allow", "GET");
  return response;
};

export const PATCH = withAllow(frozen);
export const PUT = withAllow(frozen);
export const DELETE = withAllow(frozen);
