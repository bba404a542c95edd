// Attachments through their route handlers against the project's own S3 fake (s3rver):
// the type is sniffed from the bytes, the size is capped at 10 MB, and a refusal stores nothing.
import { closeDb, getDb, jsonRequest, makeUser, routeParams, signInAs } from "../support";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { ListObjectsV2Command, S3Client } from "@aws-sdk/client-s3";
import type { CurrentUser } from "@/app/_server/auth";
import { GET as listRoute, POST as uploadRoute } from "@/app/api/notebooks/[id]/attachments/route";
import { DELETE as removeRoute, GET as downloadRoute } from "@/app/api/attachments/[id]/route";
import { POST as placeRoute } from "@/app/api/attachments/[id]/figure/route";
import { readNotebookDocument } from "@/app/_server/collab/documents";
import { startLocalObjectStore, type LocalObjectStore } from "@/app/_server/storage/local-s3";
import { createGroupWithLead } from "@/db/queries/groups";
import { addMember } from "@/db/queries/members";
import { createNotebook } from "@/db/queries/notebooks";
import { listAttachments } from "@/db/queries/attachments";
import { createEdition } from "@/db/queries/editions";
import { tinyPng } from "../../support/png";

let lead: CurrentUser, reader: CurrentUser, outsider: CurrentUser;
let notebookId: string;
let store: LocalObjectStore;

function upload(name: string, bytes: Uint8Array, as: CurrentUser = lead, type = "application/octet-stream") {
  signInAs(as);
  const form = new FormData();
  form.set("file", new File([Buffer.from(bytes)], name, { type }));
  return uploadRoute(new Request(`http://localhost/api/notebooks/${notebookId}/attachments`, { method: "POST", body: form }), routeParams({ id: notebookId }));
}

async function storedObjects(): Promise<string[]> {
  const { endpoint, region, accessKeyId, secretAccessKey, bucket } = store.config;
  const client = new S3Client({ endpoint, region, forcePathStyle: true, credentials: { accessKeyId, secretAccessKey } });
  const listed = await client.send(new ListObjectsV2Command({ Bucket: bucket }));
  return (listed.Contents ?? []).map((o) => o.Key!);
}

async function rowCount() {
  return (await listAttachments({ db: await getDb(), notebookId })).length;
}

beforeAll(async () => {
  store = await startLocalObjectStore({ dataDir: "memory://" });
  const db = await getDb();
  [lead, reader, outsider] = await Promise.all(["lead", "reader", "outsider"].map(makeUser));
  const groupId = (await createGroupWithLead({ db, name: "Figure group", leadUserId: lead.id })).id;
  await addMember({ db, groupId, userId: reader.id, role: "reader" });
  notebookId = (await createNotebook({ db, groupId, title: "Potential plots", createdBy: lead.id })).id;
}, 120_000);
afterAll(async () => {
  await store?.close();
  await closeDb();
});

describe("uploading", () => {
  it("refuses a renamed executable (415) and stores nothing", async () => {
    // The first bytes of an ELF executable (0x7f 'E' 'L' 'F', then binary header fields).
    const elf = Buffer.concat([Buffer.from([0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01, 0x01, 0x00]), Buffer.alloc(120)]);
    const response = await upload("orbit-plot.png", elf, lead, "image/png");
    expect(response.status).toBe(415);
    expect((await response.json()).error.code).toBe("unsupported_media_type:attachment");
    const script = Buffer.from("#!/bin/sh\necho gotcha\n");
    expect((await upload("data.csv", script)).status).toBe(415);
    expect(await rowCount()).toBe(0);
    expect(await storedObjects()).toEqual([]);
  });

  it("refuses a file over 10 MB (413) and stores nothing", async () => {
    const big = Buffer.concat([tinyPng(), Buffer.alloc(10 * 1024 * 1024)]);
    const response = await upload("huge.png", big);
    expect(response.status).toBe(413);
    expect(await rowCount()).toBe(0);
    expect(await storedObjects()).toEqual([]);
  });

  it("refuses a reader before reading the file", async () => {
    expect((await upload("plot.png", tinyPng(), reader)).status).toBe(403);
    expect(await rowCount()).toBe(0);
  });

  it("stores a PNG under the type its bytes say, whatever its name, and a CSV", async () => {
    const response = await upload("Plot of V_eff.jpeg", tinyPng(), lead, "image/jpeg");
    expect(response.status).toBe(201);
    const { attachment } = await response.json();
    expect(attachment).toMatchObject({ contentType: "image/png", fileName: "Plot of V_eff.png", figure: true, size: tinyPng().length });
    const csv = await upload("orbits.csv", Buffer.from("r,V\n6,-0.0555\n"));
    expect((await csv.json()).attachment).toMatchObject({ contentType: "text/csv", figure: false });
    expect(await rowCount()).toBe(2);
    expect(await storedObjects()).toHaveLength(2);
  });
});

describe("downloading and placing", () => {
  it("serves the bytes with safe headers to members, and not to outsiders", async () => {
    const [png] = (await listAttachments({ db: await getDb(), notebookId })).filter((a) => a.contentType === "image/png");
    signInAs(reader);
    const response = await downloadRoute(jsonRequest("GET", "/x"), routeParams({ id: png.id }));
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("image/png");
    expect(response.headers.get("x-content-type-options")).toBe("nosniff");
    expect(response.headers.get("content-disposition")).toMatch(/^attachment; filename="Plot of V_eff\.png"/);
    expect(Buffer.from(await response.arrayBuffer()).equals(tinyPng())).toBe(true);
    signInAs(outsider);
    expect((await downloadRoute(jsonRequest("GET", "/x"), routeParams({ id: png.id }))).status).toBe(403);
    signInAs(null);
    expect((await downloadRoute(jsonRequest("GET", "/x"), routeParams({ id: png.id }))).status).toBe(401);
  });

  it("places a figure in the document; CSV data cannot be a figure", async () => {
    const all = await listAttachments({ db: await getDb(), notebookId });
    const png = all.find((a) => a.contentType === "image/png")!;
    const csv = all.find((a) => a.contentType === "text/csv")!;
    signInAs(lead);
    expect((await placeRoute(jsonRequest("POST", "/x", { caption: "Effective potential" }), routeParams({ id: png.id }))).status).toBe(201);
    expect((await placeRoute(jsonRequest("POST", "/x", {}), routeParams({ id: csv.id }))).status).toBe(409);
    const { json } = (await readNotebookDocument({ db: await getDb(), notebookId }))!;
    const figures = (json.content as { type: string; attrs?: Record<string, unknown> }[]).filter((n) => n.type === "figure");
    expect(figures).toEqual([{ type: "figure", attrs: { attachmentId: png.id, format: "image", caption: "Effective potential" } }]);
  });

  it("lists attachments for members", async () => {
    signInAs(reader);
    const { attachments } = await (await listRoute(jsonRequest("GET", "/x"), routeParams({ id: notebookId }))).json();
    expect(attachments).toHaveLength(2);
  });
});

describe("removing", () => {
  const remove = (id: string, as: CurrentUser | null = lead) => {
    signInAs(as);
    return removeRoute(jsonRequest("DELETE", "/x"), routeParams({ id }));
  };

  it("refuses readers and signed-out visitors, and keeps the attachment", async () => {
    const [csv] = (await listAttachments({ db: await getDb(), notebookId })).filter((a) => a.contentType === "text/csv");
    expect((await remove(csv.id, reader)).status).toBe(403);
    expect((await remove(csv.id, null)).status).toBe(401);
    expect(await rowCount()).toBe(2);
  });

  it("refuses while a figure in the notebook shows it", async () => {
    const [png] = (await listAttachments({ db: await getDb(), notebookId })).filter((a) => a.contentType === "image/png");
    const response = await remove(png.id);
    expect(response.status).toBe(409);
    expect((await response.json()).error.message).toMatch(/remove the figure first/);
    expect(await storedObjects()).toHaveLength(2);
  });

  it("removes data no figure shows: the row and the bytes go, a second removal finds nothing", async () => {
    const [csv] = (await listAttachments({ db: await getDb(), notebookId })).filter((a) => a.contentType === "text/csv");
    expect((await remove(csv.id)).status).toBe(204);
    expect(await rowCount()).toBe(1);
    expect(await storedObjects()).toHaveLength(1);
    expect((await remove(csv.id)).status).toBe(404);
  });

  it("keeps for good what a published edition shows, even once no figure in the notebook does", async () => {
    const { attachment } = await (await upload("residuals.png", tinyPng())).json();
    const content = { type: "doc", content: [{ type: "figure", attrs: { attachmentId: attachment.id, format: "image", caption: "" } }] };
    await createEdition({ db: await getDb(), notebookId, title: "Potential plots", content, ledger: [], reason: null, publishedBy: lead.id, hashFor: () => "0".repeat(64) });
    const response = await remove(attachment.id);
    expect(response.status).toBe(409);
    expect((await response.json()).error.message).toMatch(/published edition/);
    expect(await storedObjects()).toHaveLength(2);
  });
});
