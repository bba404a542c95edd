import "server-only";
import type { Db } from "@/db/client";
import { getLatestCheckpoint, listNotebooksDueAutoCheckpoint } from "@/db/queries/checkpoints";
import { readNotebookDocument } from "../collab/documents";
import { checkpointNotebook } from "./save";
import { canonicalJson } from "../editions/canonical";

export interface AutoCheckpointPolicy {
  /** At most one automatic checkpoint per notebook per this many minutes. */
  readonly everyMinutes: number;
  /** A notebook counts as idle once nobody has changed it for this many seconds. */
  readonly idleSeconds: number;
}

/** From AUTO_CHECKPOINT_MINUTES (default 10) and AUTO_CHECKPOINT_IDLE_SECONDS (default 60). */
export function autoCheckpointPolicy(env: Record<string, string | undefined> = process.env): AutoCheckpointPolicy {
  const minutes = Number(env.AUTO_CHECKPOINT_MINUTES);
  const idle = Number(env.AUTO_CHECKPOINT_IDLE_SECONDS);
  return { everyMinutes: minutes > 0 ? minutes : 10, idleSeconds: idle >= 0 && env.AUTO_CHECKPOINT_IDLE_SECONDS ? idle : 60 };
}

/**
 * One pass: saves an automatic checkpoint of every notebook that was edited, has been idle
 * since, and has had no automatic checkpoint within the policy's minutes. The co-editing
 * room compacts an idle notebook and stamps its updated time, which is what "edited" reads.
 * A notebook whose document equals its latest checkpoint (a rename, say) is skipped.
 */
export async function saveDueAutoCheckpoints({ db, policy, now = new Date() }: { db: Db; policy: AutoCheckpointPolicy; now?: Date }): Promise<string[]> {
  const due = await listNotebooksDueAutoCheckpoint({
    db,
    idleSince: new Date(now.getTime() - policy.idleSeconds * 1000),
    autoSince: new Date(now.getTime() - policy.everyMinutes * 60_000),
  });
  const saved: string[] = [];
  for (const notebookId of due) {
    const [latest, current] = await Promise.all([getLatestCheckpoint({ db, notebookId }), readNotebookDocument({ db, notebookId })]);
    if (!current) continue;
    if (latest?.content && canonicalJson(latest.content) === canonicalJson(current.json)) continue;
    await checkpointNotebook({ db, notebookId, kind: "auto", label: "Automatic", createdBy: null });
    saved.push(notebookId);
  }
  return saved;
}

/** Runs {@link saveDueAutoCheckpoints} every minute until stopped; failures are logged, never thrown. */
export function startAutoCheckpoints({ db, policy = autoCheckpointPolicy(), intervalMs = 60_000 }: { db: Db; policy?: AutoCheckpointPolicy; intervalMs?: number }): { stop(): void } {
  let running = false;
  const timer = setInterval(() => {
    if (running) return;
    running = true;
    saveDueAutoCheckpoints({ db, policy })
      .catch((error: unknown) => console.error("[checkpoints] automatic checkpoint pass failed", error))
      .finally(() => (running = false));
  }, intervalMs);
  timer.unref();
  return { stop: () => clearInterval(timer) };
}
