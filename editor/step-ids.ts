import { Extension } from "@tiptap/core";
import type { Node as PMNode } from "@tiptap/pm/model";
import { Plugin, PluginKey, type Transaction } from "@tiptap/pm/state";
import { ySyncPluginKey } from "@tiptap/y-tiptap";
import { newStepId } from "./step-id";

export const stepIdsKey = new PluginKey("stepIds");

function stepPositions(doc: PMNode): Array<{ id: string | null; pos: number }> {
  const found: Array<{ id: string | null; pos: number }> = [];
  doc.descendants((node, pos) => {
    if (node.type.name === "step") found.push({ id: node.attrs.id ?? null, pos });
    return node.isBlock && node.type.name !== "step";
  });
  return found;
}

function isRemote(transactions: readonly Transaction[]): boolean {
  return transactions.every((tr) => tr.getMeta(ySyncPluginKey)?.isChangeOrigin === true);
}

/**
 * Keeps every step's `id` present and unique: a step without an id gets one, and when a
 * copy-paste duplicates an id, the step that had it before the change keeps it and the
 * copy gets a fresh one — so citations keep pointing at the original.
 *
 * Contract: runs as `appendTransaction` on local changes only; changes that arrive from
 * Yjs were already fixed by the client that made them, so two clients never race to
 * rename the same step.
 *
 * @example
 * // after pasting a copy of step "st-a" above it, the copy is renamed and "st-a" stays put
 */
export const StepIds = Extension.create({
  name: "stepIds",

  addProseMirrorPlugins() {
    return [
      new Plugin({
        key: stepIdsKey,
        appendTransaction: (transactions, oldState, newState) => {
          if (!transactions.some((tr) => tr.docChanged) || isRemote(transactions)) return null;
          const oldPositions = new Map<string, number>();
          for (const { id, pos } of stepPositions(oldState.doc)) if (id) oldPositions.set(id, pos);
          const mapPos = (pos: number) => transactions.reduce((p, tr) => tr.mapping.map(p), pos);

          const steps = stepPositions(newState.doc);
          const byId = new Map<string, number[]>();
          for (const { id, pos } of steps) if (id) byId.set(id, [...(byId.get(id) ?? []), pos]);

          const rename: number[] = steps.filter((s) => !s.id).map((s) => s.pos);
          for (const [id, positions] of byId) {
            if (positions.length < 2) continue;
            const old = oldPositions.get(id);
            const keeper = old !== undefined && positions.includes(mapPos(old)) ? mapPos(old) : positions[0];
            rename.push(...positions.filter((pos) => pos !== keeper));
          }
          if (rename.length === 0) return null;
          const tr = newState.tr;
          for (const pos of rename) tr.setNodeAttribute(pos, "id", newStepId());
          return tr.setMeta("addToHistory", false);
        },
      }),
    ];
  },
});
