"use client";

import type { Editor } from "@tiptap/core";
import { useEffect } from "react";
import { planAllChecks } from "@/editor/check-request";
import { extractDerivation } from "@/editor/derivation";
import { CheckScheduler, type StepChecker } from "@/editor/step-checker";
import { stepVerdictsKey } from "@/editor/step-verdicts";

/**
 * Keeps the verdict margin in step with the document: every change (local or from a
 * co-author) re-plans the checks after a quiet period; answers land in the verdict plugin.
 */
export function useStepChecks(editor: Editor | null, checker: StepChecker | null): void {
  useEffect(() => {
    if (!editor || !checker) return;
    const scheduler = new CheckScheduler({
      checker,
      onVerdicts: (entries) => {
        if (!editor.isDestroyed) editor.commands.setStepVerdicts(entries);
      },
    });
    const plan = () => planAllChecks(extractDerivation(editor.getJSON()));
    const shown = () => stepVerdictsKey.getState(editor.state)?.verdicts ?? new Map();
    scheduler.apply(plan());
    const onUpdate = () => scheduler.schedule(plan, shown);
    editor.on("update", onUpdate);
    return () => {
      editor.off("update", onUpdate);
      scheduler.dispose();
    };
  }, [editor, checker]);
}
