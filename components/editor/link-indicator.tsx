"use client";

import { useLayoutEffect, useRef } from "react";
import type { LinkState, StoredFlag } from "./use-collaboration";

/**
 * Whether what was typed here is stored on the server, in words and a shape. The link's state
 * comes as a prop; whether everything is stored is read from `stored` and written into the
 * line directly, because it flips with every burst of typing and a React commit then would
 * cost the keystroke more than the typing itself (see {@link StoredFlag}).
 */
export function LinkIndicator({ link, stored, readOnly }: { link: LinkState; stored: StoredFlag; readOnly: boolean }) {
  const line = useRef<HTMLParagraphElement>(null);
  const mark = useRef<HTMLSpanElement>(null);
  const words = useRef<HTMLSpanElement>(null);

  useLayoutEffect(() => {
    const show = (allStored: boolean) => {
      const shown = describe(link, allStored, readOnly);
      if (mark.current) mark.current.textContent = shown.mark;
      if (words.current) words.current.textContent = shown.text;
      line.current?.classList.toggle("text-alarm", shown.alarm);
      line.current?.classList.toggle("text-ink-muted", !shown.alarm);
    };
    show(stored.allStored);
    stored.on("change", show);
    return () => stored.off("change", show);
  }, [link, stored, readOnly]);

  // the spans' text is written by the effect above, never by React
  return (
    <p ref={line} role="status" aria-live="polite" className="flex items-center gap-2 font-sans text-xs">
      <span ref={mark} aria-hidden="true" />
      <span ref={words} />
    </p>
  );
}

function describe(link: LinkState, allStored: boolean, readOnly: boolean): { mark: string; text: string; alarm: boolean } {
  switch (link.kind) {
    case "connecting":
      return { mark: "○", text: "Connecting to the server…", alarm: false };
    case "online":
      if (readOnly) return { mark: "●", text: "Live: co-authors' edits appear as they type", alarm: false };
      return allStored
        ? { mark: "●", text: "Everything is stored on the server", alarm: false }
        : { mark: "◐", text: "Storing your latest changes…", alarm: false };
    case "offline":
      return {
        mark: "▲",
        text: readOnly
          ? "Offline: showing the last copy this browser has"
          : allStored
            ? "Offline: nothing waiting; edits are kept in this browser until the link returns"
            : "Offline: your changes are kept in this browser and will be merged when the link returns",
        alarm: true,
      };
    case "refused":
      return { mark: "▲", text: link.message, alarm: true };
  }
}
