// PATCH /api/remarks/:id — :id is a thread or any reply in it (the change applies to its thread)
//   {"action": "reply", "body"} (reviewer, author or lead) → 200 {"thread"}; mails the notebook's authors and leads
//     and everyone who wrote in the thread, not the writer
//   {"action": "settle"} | {"action": "reopen"} (reviewer, author or lead) → 200 {"thread"}
//   → 400 bad_request:*, 401 unauthorized:session, 403 forbidden:notebook, 404 not_found:remark,
//     409 conflict:remark when it is already settled / already open
import { getDb } from "@/db/client";
import { getNotebookById } from "@/db/queries/notebooks";
import { addRemarkReply, getRemarkById, getRemarkThread, setRemarkSettled, type RemarkAnchor } from "@/db/queries/remarks";
import { readNotebookDocument } from "@/app/_server/collab/documents";
import { AppError, handleRoute } from "@/app/_server/errors";
import { auditChange, authorize, loadActor, requireUser } from "@/app/_server/guard";
import { describeAnchor, notifyRemark, stepNumberOf } from "@/app/_server/mail/remark-mail";
import { parseJsonBody, parseParams } from "@/app/_server/parse";
import { changeRemarkBody, remarkParams } from "./schema";

export const dynamic = "force-dynamic";

type Params = { id: string };

export const PATCH = handleRoute<Params>(async (request, { params }) => {
  const { id } = await parseParams(params, remarkParams);
  const change = await parseJsonBody(request, changeRemarkBody);
  const user = await requireUser();
  const db = await getDb();
  const remark = await getRemarkById({ db, id });
  const notebook = remark ? await getNotebookById({ db, id: remark.notebookId }) : null;
  if (!remark || !notebook) throw new AppError("not_found:remark", "No remark with that id.");
  const threadId = remark.parentId ?? remark.id;
  const actor = await loadActor({ db, user });
  const resource = { type: "notebook", groupId: notebook.groupId, notebookId: notebook.id } as const;
  await authorize({ db, actor, action: change.action === "reply" ? "notebook:remark" : "notebook:settle-remark", resource, request });

  if (change.action === "reply") {
    const reply = await addRemarkReply({ db, threadId, authorId: user.id, body: change.body });
    await auditChange({ db, actor, action: "notebook:remark-reply", resourceType: "remark", resourceId: reply.id, detail: { threadId }, request });
    const thread = await getRemarkThread({ db, notebookId: notebook.id, id: threadId });
    const anchor: RemarkAnchor = thread?.anchor ?? {};
    const document = anchor.stepId ? await readNotebookDocument({ db, notebookId: notebook.id }) : null;
    const where = describeAnchor(anchor, anchor.stepId && document ? stepNumberOf(document.json, anchor.stepId) : null);
    await notifyRemark({ db, notebook, threadId, writer: user, body: change.body, isReply: true, where });
    return Response.json({ thread: await getRemarkThread({ db, notebookId: notebook.id, id: threadId }) });
  }

  const thread = await getRemarkById({ db, id: threadId });
  const settle = change.action === "settle";
  if (thread?.settled === settle) throw new AppError("conflict:remark", settle ? "This remark is already settled." : "This remark is already open.");
  await setRemarkSettled({ db, threadId, settled: settle, userId: user.id });
  await auditChange({ db, actor, action: settle ? "notebook:settle-remark" : "notebook:reopen-remark", resourceType: "remark", resourceId: threadId, request });
  return Response.json({ thread: await getRemarkThread({ db, notebookId: notebook.id, id: threadId }) });
});
