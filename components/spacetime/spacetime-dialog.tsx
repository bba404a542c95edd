"use client";

import { useEffect, useRef, type ReactNode } from "react";
import { createPortal } from "react-dom";

/**
 * A modal sheet over the notebook, rendered outside the editor's DOM (a portal to
 * <body>) so the editor never sees its keystrokes, clicks or selections.
 * Escape or the Close button closes it.
 */
export function SpacetimeDialog({ title, subtitle, onClose, children }: { title: string; subtitle?: ReactNode; onClose: () => void; children: ReactNode }) {
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const dialog = ref.current;
    if (dialog && !dialog.open) dialog.showModal();
    return () => dialog?.close();
  }, []);
  return createPortal(
    <dialog
      ref={ref}
      aria-label={title}
      onCancel={(event) => {
        event.preventDefault();
        onClose();
      }}
      className="m-auto max-h-[92vh] w-[min(72rem,96vw)] overflow-y-auto rounded-lg border border-paper-edge bg-paper p-0 text-ink shadow-xl backdrop:bg-ink/30"
    >
      <div className="sticky top-0 z-10 flex items-start justify-between gap-4 border-b border-paper-edge bg-paper/95 px-6 py-3">
        <div>
          <h2 className="font-serif text-xl">{title}</h2>
          {subtitle ? <div className="font-sans text-xs text-ink-muted">{subtitle}</div> : null}
        </div>
        <button type="button" onClick={onClose} className="rounded border border-paper-edge px-3 py-1 font-sans text-sm hover:bg-paper-deep">
          Close
        </button>
      </div>
      <div className="px-6 py-4">{children}</div>
    </dialog>,
    document.body,
  );
}
