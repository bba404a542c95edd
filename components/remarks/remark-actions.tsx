"use client";

import { createContext, useContext } from "react";

/**
 * What the editor's step views may ask of the remarks side list. Provided around the
 * editor; without a provider (or without permission) steps show no remark button.
 */
export interface RemarkActions {
  readonly canRemark: boolean;
  /** Opens the new-remark form anchored to a step. */
  remarkOnStep(stepId: string): void;
  /** How many open threads point at each step id. */
  readonly openByStep: ReadonlyMap<string, number>;
}

export const RemarkActionsContext = createContext<RemarkActions | null>(null);

export function useRemarkActions(): RemarkActions | null {
  return useContext(RemarkActionsContext);
}

/** The small margin button of a step: "Remark on step N", with the count of open threads on it. */
export function StepRemarkButton({ stepId, stepNumber }: { stepId: string | null; stepNumber: number | null }) {
  const actions = useRemarkActions();
  if (!actions || !stepId) return null;
  const open = actions.openByStep.get(stepId) ?? 0;
  const count = open > 0 ? <span>· {open} open</span> : null;
  const look = "mt-1 inline-flex items-center gap-1 rounded border border-paper-edge bg-paper px-1.5 py-0.5 font-sans text-xs text-ink-soft";
  if (!actions.canRemark) {
    return open > 0 ? <span className={look}>{open} open remark{open === 1 ? "" : "s"}</span> : null;
  }
  return (
    <button
      type="button"
      onClick={() => actions.remarkOnStep(stepId)}
      aria-label={`Remark on step ${stepNumber ?? ""}${open > 0 ? `, ${open} open` : ""}`}
      className={`${look} hover:text-ink`}
    >
      <span aria-hidden="true">✎ remark</span>
      {count}
    </button>
  );
}
