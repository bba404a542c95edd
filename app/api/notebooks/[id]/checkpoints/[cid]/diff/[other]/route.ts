// GET /api/notebooks/:id/checkpoints/:a/diff/:b (any member) — what changed from checkpoint a to checkpoint b
//   → 200 {"from": {"id", "label", "createdAt"}, "to": {…}, "unchanged": n, "otherContentChanged": bool,
//          "steps": [{"change": "added"|"removed"|"changed", "id", "fields"?: ["relation"|"justification"|"citations"],
//                     "before"?: side, "after"?: side}]}
//     side = {"number", "relation", "kind", "detail", "cites", "verdict": "verified"|"refuted"|"undecided"|null, "method", "witness"?}
//     steps are matched by their stable id; the differing steps are re-checked in each version
//   → 401 unauthorized:session, 403 forbidden:notebook, 404 not_found:notebook | not_found:checkpoint
import type { JSONContent } from "@tiptap/core";
import { getCheckpoint } from "@/db/queries/checkpoints";
import { diffDocuments } from "@/app/_server/checkpoints/diff";
import { AppError, handleRoute } from "@/app/_server/errors";
import { admitToNotebook } from "@/app/_server/guard";
import { parseParams } from "@/app/_server/parse";
import { diffParams } from "../../../schema";

export const dynamic = "force-dynamic";

type Params = { id: string; cid: string; other: string };

const EMPTY: JSONContent = { type: "doc", content: [] };

export const GET = handleRoute<Params>(async (request, { params }) => {
  const { id, cid, other } = await parseParams(params, diffParams);
  const { db, notebook } = await admitToNotebook({ notebookId: id, action: "notebook:read", request });
  const [from, to] = await Promise.all([getCheckpoint({ db, notebookId: notebook.id, id: cid }), getCheckpoint({ db, notebookId: notebook.id, id: other })]);
  if (!from || !to) throw new AppError("not_found:checkpoint", "No checkpoint with that id in this notebook.");
  const diff = await diffDocuments({ before: (from.content ?? EMPTY) as JSONContent, after: (to.content ?? EMPTY) as JSONContent });
  const describe = (c: typeof from) => ({ id: c.id, label: c.label, kind: c.kind, createdAt: c.createdAt });
  return Response.json({ from: describe(from), to: describe(to), ...diff });
});
