"use client";

import { useLayoutEffect, useRef, useState, type ReactNode } from "react";
import { createPortal } from "react-dom";
import { canAdoptSheets, copiedPageSheet } from "./shadow-sheets";

/** Marks the host of a step's controls; the step's node view leaves their events to them. */
export const CHROME_HOST_ATTRIBUTE = "data-step-chrome";

/** Every page rule: the controls inside are styled like the rest of the page. */
const pageSheet = () => copiedPageSheet("page", () => true);

/**
 * A step's controls and verdict margin, kept in a shadow root. Chromium walks the text of the
 * whole editing host around the caret on every keystroke (to tell an input method what is
 * there); controls and verdict text inside the notebook were a third of that walk, and in a
 * shadow root they are out of it. They stay in the accessibility tree, and React events reach
 * them through the portal. Where shadow roots cannot adopt sheets, the children render in place.
 */
export function ShadowChrome({ as: Tag = "div", className, label, children }: { as?: "div" | "aside"; className?: string; label?: string; children: ReactNode }) {
  const host = useRef<HTMLDivElement>(null);
  const [root, setRoot] = useState<ShadowRoot | "in place" | null>(null);
  useLayoutEffect(() => {
    const element = host.current;
    if (!element) return;
    if (!canAdoptSheets(element)) {
      setRoot("in place");
      return;
    }
    const shadow = element.shadowRoot ?? element.attachShadow({ mode: "open" });
    const sheet = pageSheet();
    if (shadow.adoptedStyleSheets[0] !== sheet) shadow.adoptedStyleSheets = [sheet];
    setRoot(shadow);
  }, []);
  const content = root === "in place" ? children : root ? createPortal(children, root) : null;
  const hostProps = { contentEditable: false, className, "aria-label": label, [CHROME_HOST_ATTRIBUTE]: "" };
  return Tag === "aside" ? <aside ref={host} {...hostProps}>{content}</aside> : <div ref={host} {...hostProps}>{content}</div>;
}

/** True for an event that started inside a step's controls (events leave a shadow root retargeted to its host). */
export function startedInStepChrome(event: Event): boolean {
  const origin = event.composedPath()[0];
  if (!(origin instanceof Node)) return false;
  const root = origin.getRootNode();
  if (root instanceof ShadowRoot) return root.host.hasAttribute(CHROME_HOST_ATTRIBUTE);
  // rendered in place (no shadow roots): the host is an ancestor
  const element = origin instanceof Element ? origin : origin.parentElement;
  return element?.closest(`[${CHROME_HOST_ATTRIBUTE}]`) != null;
}
