"use client";

import type { LinkState } from "./use-collaboration";

/** Whether what was typed here is stored on the server, in words and a shape. */
export function LinkIndicator({ link, readOnly }: { link: LinkState; readOnly: boolean }) {
  const { mark, text, alarm } = describe(link, readOnly);
  return (
    <p role="status" aria-live="polite" className={`flex items-center gap-2 font-sans text-xs ${alarm ? "text-alarm" : "text-ink-muted"}`}>
      <span aria-hidden="true">{mark}</span>
      {text}
    </p>
  );
}

function describe(link: LinkState, readOnly: boolean): { mark: string; text: string; alarm: boolean } {
  switch (link.kind) {
    case "connecting":
      return { mark: "○", text: "Connecting to the server…", alarm: false };
    case "online":
      if (readOnly) return { mark: "●", text: "Live: co-authors' edits appear as they type", alarm: false };
      return link.allStored
        ? { mark: "●", text: "Everything is stored on the server", alarm: false }
        : { mark: "◐", text: "Storing your latest changes…", alarm: false };
    case "offline":
      return {
        mark: "▲",
        text: readOnly
          ? "Offline: showing the last copy this browser has"
          : link.allStored
            ? "Offline: nothing waiting; edits are kept in this browser until the link returns"
            : "Offline: your changes are kept in this browser and will be merged when the link returns",
        alarm: true,
      };
    case "refused":
      return { mark: "▲", text: link.message, alarm: true };
  }
}
