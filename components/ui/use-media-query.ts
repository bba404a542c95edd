"use client";

import { useSyncExternalStore } from "react";

/**
 * Whether a CSS media query matches now, following changes. For layouts that would otherwise
 * render a large subtree twice and hide one copy with CSS. On the server: `serverValue`.
 */
export function useMediaQuery(query: string, serverValue = false): boolean {
  return useSyncExternalStore(
    (onChange) => {
      const list = window.matchMedia(query);
      list.addEventListener("change", onChange);
      return () => list.removeEventListener("change", onChange);
    },
    () => window.matchMedia(query).matches,
    () => serverValue,
  );
}
