"use client";

import { useEffect, useState, type RefObject } from "react";

/** How far outside the visible area a block counts as near: about a screen above and below. */
const NEAR_MARGIN = "900px 0px";

type Listener = (near: boolean) => void;
let observer: IntersectionObserver | null = null;
const listeners = new Map<Element, Listener>();

/** One observer for every block: hundreds of steps each with their own would cost more than they save. */
function sharedObserver(): IntersectionObserver {
  observer ??= new IntersectionObserver(
    (entries) => {
      for (const entry of entries) listeners.get(entry.target)?.(entry.isIntersecting);
    },
    { rootMargin: NEAR_MARGIN },
  );
  return observer;
}

/**
 * Whether the element is on screen or within about a screen of it. A long notebook renders the
 * heavy parts of its steps (the KaTeX preview, the justification controls) only there: every
 * keystroke costs style, layout and paint in proportion to the page, and React walks the
 * editable DOM on each commit. Without IntersectionObserver (tests, old browsers) everything
 * counts as near.
 */
export function useNearViewport(ref: RefObject<Element | null>): boolean {
  const [near, setNear] = useState(() => typeof IntersectionObserver === "undefined");
  useEffect(() => {
    const element = ref.current;
    if (!element || typeof IntersectionObserver === "undefined") return;
    const shared = sharedObserver();
    listeners.set(element, setNear);
    shared.observe(element);
    return () => {
      listeners.delete(element);
      shared.unobserve(element);
    };
  }, [ref]);
  return near;
}
