"use client";

import { useEffect, useState, type RefObject } from "react";

/** How far outside the visible area a block counts as near: about a screen above and below. */
const NEAR_MARGIN = "900px 0px";

type Listener = (near: boolean) => void;
const observers = new Map<string, IntersectionObserver>();
const listeners = new Map<Element, Listener>();

/**
 * One observer per margin for every element: hundreds of steps each with their own would cost
 * more than they save. The margin applies to the viewport and, as `scrollMargin`, to scrolling
 * boxes on the way (the outline column scrolls on its own); browsers without `scrollMargin`
 * ignore it and count only what is inside such a box as near.
 */
function sharedObserver(margin: string): IntersectionObserver {
  let observer = observers.get(margin);
  if (!observer) {
    const options = { rootMargin: margin, scrollMargin: margin } as IntersectionObserverInit;
    observer = new IntersectionObserver((entries) => {
      for (const entry of entries) listeners.get(entry.target)?.(entry.isIntersecting);
    }, options);
    observers.set(margin, observer);
  }
  return observer;
}

/**
 * Whether the element is on screen or within `margin` of it. A long notebook renders the heavy
 * parts of its steps (the KaTeX preview, the justification controls) and of its outline (each
 * step's KaTeX) only there: every frame costs style, layout, paint and compositing in
 * proportion to the page, and React walks the editable DOM on each commit. Without
 * IntersectionObserver (tests, old browsers) everything counts as near.
 */
export function useNearViewport(ref: RefObject<Element | null>, margin: string = NEAR_MARGIN): boolean {
  const [near, setNear] = useState(() => typeof IntersectionObserver === "undefined");
  useEffect(() => {
    const element = ref.current;
    if (!element || typeof IntersectionObserver === "undefined") return;
    const shared = sharedObserver(margin);
    listeners.set(element, setNear);
    shared.observe(element);
    return () => {
      listeners.delete(element);
      shared.unobserve(element);
    };
  }, [ref, margin]);
  return near;
}
