// LaTeX export through its route handler: an edition of a demo notebook with a placed figure
// comes as a zip (the .tex and figures/) that compiles with pdflatex; the working copy as a .tex.
import { closeDb, getDb, jsonRequest, makeUser, routeParams, signInAs } from "../support";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { spawnSync } from "node:child_process";
import { mkdtempSync, readdirSync, rmSync, writeFileSync, mkdirSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import JSZip from "jszip";
import type { CurrentUser } from "@/app/_server/auth";
import { GET as exportRoute } from "@/app/api/notebooks/[id]/export/route";
import { POST as publishRoute } from "@/app/api/notebooks/[id]/editions/route";
import { editNotebookDocument } from "@/app/_server/collab/documents";
import { appendFigure } from "@/app/_server/storage/place-figure";
import { startLocalObjectStore, type LocalObjectStore } from "@/app/_server/storage/local-s3";
import { storeAttachment } from "@/app/_server/storage/upload";
import { createGroupWithLead } from "@/db/queries/groups";
import { addMember } from "@/db/queries/members";
import { createNotebook } from "@/db/queries/notebooks";
import { buildKestrelSchwarzschildOrbits } from "@/db/demo/notebooks/kestrel-schwarzschild-orbits";
import { tinyPng } from "../../support/png";

let lead: CurrentUser, reader: CurrentUser;
let notebookId: string;
let store: LocalObjectStore;
const work = mkdtempSync(path.join(os.tmpdir(), "vierbein-export-"));
const hasPdflatex = spawnSync("pdflatex", ["--version"]).status === 0;
if (!hasPdflatex) console.warn("[export test] pdflatex is not installed: the compile checks below are SKIPPED (install texlive-latex-base).");

function compile(dir: string, file: string) {
  const run = spawnSync("pdflatex", ["-interaction=nonstopmode", "-halt-on-error", file], { cwd: dir, encoding: "utf8", timeout: 120_000 });
  return { status: run.status, log: run.stdout.split("\n").filter((l) => l.startsWith("!")).join("\n") };
}

const exportOf = (query: string) => exportRoute(jsonRequest("GET", `/api/notebooks/${notebookId}/export?${query}`), routeParams({ id: notebookId }));

beforeAll(async () => {
  store = await startLocalObjectStore({ dataDir: "memory://" });
  const db = await getDb();
  [lead, reader] = await Promise.all(["lead", "reader"].map(makeUser));
  const groupId = (await createGroupWithLead({ db, name: "Strong & Weak Fields", leadUserId: lead.id })).id;
  await addMember({ db, groupId, userId: reader.id, role: "reader" });
  notebookId = (await createNotebook({ db, groupId, title: "Kestrel-7 orbits — 100% checked?", createdBy: lead.id, content: buildKestrelSchwarzschildOrbits() as Record<string, unknown> })).id;
  const figure = await storeAttachment({ db, notebookId, uploadedBy: lead.id, name: "potential.png", bytes: tinyPng(16, 16) });
  await editNotebookDocument({ db, notebookId, userId: lead.id, edit: appendFigure({ attachmentId: figure.id, format: "image", caption: "V_eff of Kestrel-7 & its ISCO" }) });
  signInAs(lead);
  const published = await publishRoute(jsonRequest("POST", `/api/notebooks/${notebookId}/editions`, { reason: "Export test: published whatever the checker says." }), routeParams({ id: notebookId }));
  expect(published.status).toBe(201);
}, 240_000);
afterAll(async () => {
  rmSync(work, { recursive: true, force: true });
  await store?.close();
  await closeDb();
});

describe("GET /api/notebooks/:id/export?format=tex", () => {
  it("gives an edition with its figure as a zip that pdflatex compiles, readable signed out", async () => {
    signInAs(null);
    const response = await exportOf("format=tex&edition=1");
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("application/zip");
    expect(response.headers.get("content-disposition")).toBe('attachment; filename="kestrel-7-orbits-100-checked-edition-1.zip"');
    const zip = await JSZip.loadAsync(Buffer.from(await response.arrayBuffer()));
    const names = Object.keys(zip.files).filter((n) => !zip.files[n].dir);
    const texName = names.find((n) => n.endsWith(".tex"))!;
    expect(names.some((n) => /figures\/[0-9a-f-]+\.png$/.test(n))).toBe(true);
    const dir = path.join(work, "edition");
    for (const name of names) {
      mkdirSync(path.join(dir, path.dirname(name)), { recursive: true });
      writeFileSync(path.join(dir, name), await zip.files[name].async("nodebuffer"));
    }
    const tex = await zip.files[texName].async("string");
    expect(tex).toContain("\\usepackage{amsmath");
    expect(tex).toContain("\\begin{equation}\\label{step:ks05}");
    expect(tex).toMatch(/\\section\{Setup\}/);
    expect(tex).toContain("SHA-256");
    expect(tex).toMatch(/\\includegraphics\[[^\]]*\]\{figures\/[0-9a-f-]+\.png\}/);
    if (!hasPdflatex) return;
    const texDir = path.join(dir, path.dirname(texName));
    const result = compile(texDir, path.basename(texName));
    expect(result.log).toBe("");
    expect(result.status).toBe(0);
    expect(readdirSync(texDir).some((f) => f.endsWith(".pdf"))).toBe(true);
  }, 180_000);

  it("gives the working copy to members and nobody else", async () => {
    signInAs(null);
    expect((await exportOf("format=tex")).status).toBe(401);
    signInAs(reader);
    const response = await exportOf("format=tex");
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe("application/zip"); // the figure is placed here too
  });

  it("refuses other formats and missing editions", async () => {
    signInAs(reader);
    expect((await exportOf("format=docx")).status).toBe(400);
    expect((await exportOf("format=tex&edition=7")).status).toBe(404);
  });
});
