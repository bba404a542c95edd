import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openDatabase, type DbHandle } from "@/db/client";
import { editNotebookDocument, readNotebookDocument, replaceWithJson } from "@/app/_server/collab/documents";
import { connectClient, createFixture, startCollabServer, synced, waitFor, type Fixture } from "./harness";
import { readJSONFromYDoc } from "@/editor/collaboration";

const paragraph = (text: string) => ({ type: "doc", content: [{ type: "paragraph", content: [{ type: "text", text }] }] });
const textOf = (json: unknown) => JSON.stringify(json).match(/"text":"([^"]*)"/)?.[1];

let handle: DbHandle;
let fixture: Fixture;

beforeAll(async () => {
  handle = await openDatabase({ kind: "pglite", dataDir: "memory://" });
  fixture = await createFixture(handle.db);
});
afterAll(async () => {
  await handle?.close();
});

describe("server-side notebook documents", () => {
  it("changes a notebook nobody has open and reads the change back", async () => {
    await editNotebookDocument({ db: handle.db, notebookId: fixture.notebookId, userId: fixture.users.author, edit: replaceWithJson(paragraph("first version")) });
    const read = await readNotebookDocument({ db: handle.db, notebookId: fixture.notebookId });
    expect(textOf(read!.json)).toBe("first version");
    await editNotebookDocument({ db: handle.db, notebookId: fixture.notebookId, userId: null, edit: replaceWithJson(paragraph("second version")) });
    expect(textOf((await readNotebookDocument({ db: handle.db, notebookId: fixture.notebookId }))!.json)).toBe("second version");
  });

  it("reaches an open editor through the live room", async () => {
    const server = await startCollabServer(handle.db, { register: true });
    try {
      const client = connectClient(server, fixture.notebookId, fixture.users.coauthor);
      await synced(client.provider);
      expect(textOf(readJSONFromYDoc(client.doc))).toBe("second version");
      await editNotebookDocument({ db: handle.db, notebookId: fixture.notebookId, userId: fixture.users.lead, edit: replaceWithJson(paragraph("restored version")) });
      await waitFor(() => textOf(readJSONFromYDoc(client.doc)) === "restored version");
      client.provider.destroy();
    } finally {
      await server.close();
    }
    expect(textOf((await readNotebookDocument({ db: handle.db, notebookId: fixture.notebookId }))!.json)).toBe("restored version");
  });

  it("answers null for a notebook that does not exist", async () => {
    expect(await readNotebookDocument({ db: handle.db, notebookId: "00000000-0000-4000-8000-000000000000" })).toBeNull();
  });
});
