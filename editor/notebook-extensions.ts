import type { Awareness } from "y-protocols/awareness";
import type { AnyExtension } from "@tiptap/core";
import StarterKit from "@tiptap/starter-kit";
import type * as Y from "yjs";
import { collaborationExtension, presenceExtension, type CoAuthor } from "./collaboration";
import { Figure } from "./figure";
import { LatexPaste } from "./latex-paste";
import { MathDisplay } from "./math-display";
import { MathInline } from "./math-inline";
import { MathShortcuts } from "./math-shortcuts";
import { MathSourceFocus } from "./math-source-focus";
import { SpacetimeBlock } from "./spacetime-block";
import { Step } from "./step";
import { StepIds } from "./step-ids";
import { StepNumbering } from "./step-numbering";
import { StepRef } from "./step-ref";
import { StepVerdicts } from "./step-verdicts";
import { TypedText } from "./typed-text";

export interface NotebookExtensionOptions {
  /** Bind the document to this Y.Doc; turns the starter kit's own undo history off. */
  readonly collaboration?: { readonly document: Y.Doc; readonly field?: string };
  /** Show co-authors' carets from this provider's awareness (needs `collaboration`). */
  readonly presence?: { readonly provider: { awareness: Awareness }; readonly user: CoAuthor };
  /** Replacements for our nodes with a view attached (the React views live in components/). */
  readonly step?: AnyExtension;
  readonly spacetimeBlock?: AnyExtension;
  readonly figure?: AnyExtension;
}

/**
 * The complete extension list of a notebook: the starter kit (headings at levels 2–3, the
 * notebook title being level 1 on the page) plus our math, step, spacetime and figure nodes and
 * their plugins. Everything that reads a notebook's schema (tests, server export, Yjs
 * conversion) uses this list so the schema is the same everywhere.
 *
 * @example
 * const schema = getSchema(notebookExtensions());
 */
export function notebookExtensions(options: NotebookExtensionOptions = {}): AnyExtension[] {
  const collaborative = options.collaboration !== undefined;
  return [
    StarterKit.configure({
      heading: { levels: [2, 3] },
      link: { openOnClick: false, autolink: true },
      ...(collaborative ? { undoRedo: false } : {}),
    }),
    MathInline,
    MathDisplay,
    options.step ?? Step,
    StepRef,
    options.spacetimeBlock ?? SpacetimeBlock,
    options.figure ?? Figure,
    StepIds,
    StepNumbering,
    StepVerdicts,
    MathSourceFocus,
    MathShortcuts,
    LatexPaste,
    TypedText,
    ...(options.collaboration ? [collaborationExtension(options.collaboration.document, options.collaboration.field)] : []),
    ...(options.collaboration && options.presence ? [presenceExtension(options.presence.provider, options.presence.user)] : []),
  ];
}
