"use client";

import { NodeViewWrapper, type ReactNodeViewProps } from "@tiptap/react";
import { useId, useMemo, useState, type FormEvent } from "react";
import { renderLatex } from "@/editor/katex-render";
import type { DeclaredSymbol, SpacetimeBlockAttributes } from "@/editor/spacetime-block";
import { linesToList, symbolsToText, textToSymbols } from "./spacetime-block-fields";
import dynamic from "next/dynamic";

// The sheet and the panel bring the chart library and the spacetime toolkit; they load
// when first opened so the notebook itself opens without them.
const CurvatureSheet = dynamic(() => import("@/components/spacetime/curvature-sheet").then((m) => m.CurvatureSheet), { ssr: false });
const OrbitPanel = dynamic(() => import("@/components/spacetime/orbit-panel").then((m) => m.OrbitPanel), { ssr: false });

function Latex({ source, display = false }: { source: string; display?: boolean }) {
  const { html, error } = useMemo(() => renderLatex(source, display), [source, display]);
  return (
    <span title={error ?? undefined}>
      <span dangerouslySetInnerHTML={{ __html: html }} />
      {error ? <span className="ml-1 font-sans text-xs text-alarm">({error})</span> : null}
    </span>
  );
}

function SymbolTable({ caption, symbols }: { caption: string; symbols: readonly DeclaredSymbol[] }) {
  if (!symbols.length) return null;
  return (
    <table className="mt-2 w-full text-sm">
      <caption className="text-left font-sans text-xs font-medium uppercase tracking-wide text-ink-muted">{caption}</caption>
      <tbody>
        {symbols.map((s) => (
          <tr key={s.symbol} className="border-t border-paper-edge/70 align-baseline">
            <th scope="row" className="w-24 py-0.5 pr-3 text-left font-normal">
              <Latex source={s.symbol} />
            </th>
            <td className="py-0.5 pr-3 font-mono text-xs">{s.dimension || <span className="italic text-ink-muted">no dimension declared</span>}</td>
            <td className="py-0.5 text-ink-soft">{s.note}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** The panel to edit a block's declarations; plain text fields that authors can type fast. */
function SpacetimeBlockForm({ attrs, onSave, onCancel }: { attrs: SpacetimeBlockAttributes; onSave: (attrs: Partial<SpacetimeBlockAttributes>) => void; onCancel: () => void }) {
  const formId = useId();
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    const text = (name: string) => String(data.get(name) ?? "");
    onSave({
      name: text("name").trim(),
      lineElement: text("lineElement").trim(),
      coordinates: textToSymbols(text("coordinates")),
      constants: textToSymbols(text("constants")),
      assumptions: linesToList(text("assumptions")),
      parameter: text("parameter").trim() || "\\tau",
    });
  };
  const field = "mt-1 w-full rounded border border-paper-edge bg-paper px-2 py-1 font-mono text-sm";
  return (
    <form onSubmit={submit} className="mt-3 grid gap-3 font-sans text-sm" aria-label="Edit spacetime block">
      <label htmlFor={`${formId}-name`}>
        Name
        <input id={`${formId}-name`} name="name" defaultValue={attrs.name} className={field} />
      </label>
      <label htmlFor={`${formId}-line`}>
        Line element (LaTeX)
        <textarea id={`${formId}-line`} name="lineElement" defaultValue={attrs.lineElement} rows={3} className={field} />
      </label>
      <div className="grid gap-3 md:grid-cols-2">
        <label htmlFor={`${formId}-coords`}>
          Coordinates — one per line, <code>symbol : dimension</code>
          <textarea id={`${formId}-coords`} name="coordinates" defaultValue={symbolsToText(attrs.coordinates)} rows={4} className={field} />
        </label>
        <label htmlFor={`${formId}-consts`}>
          Constants — <code>symbol : dimension : note</code>
          <textarea id={`${formId}-consts`} name="constants" defaultValue={symbolsToText(attrs.constants)} rows={4} className={field} />
        </label>
      </div>
      <div className="grid gap-3 md:grid-cols-[1fr_10rem]">
        <label htmlFor={`${formId}-assume`}>
          Assumptions — one relation per line
          <textarea id={`${formId}-assume`} name="assumptions" defaultValue={attrs.assumptions.join("\n")} rows={3} className={field} />
        </label>
        <label htmlFor={`${formId}-param`}>
          Curve parameter
          <input id={`${formId}-param`} name="parameter" defaultValue={attrs.parameter} className={field} />
        </label>
      </div>
      <p className="text-xs text-ink-muted">Dimensions as words (length, time, mass, velocity, dimensionless) or in base units, e.g. <code>M L^2 T^-1</code>.</p>
      <div className="flex gap-2">
        <button type="submit" className="rounded-md border border-accent bg-accent px-3 py-1 text-paper hover:bg-accent-deep">
          Save block
        </button>
        <button type="button" onClick={onCancel} className="rounded-md border border-paper-edge px-3 py-1 hover:bg-paper-deep">
          Cancel
        </button>
      </div>
    </form>
  );
}

/**
 * The spacetime block in the notebook: its line element rendered, the declared coordinates,
 * constants (with dimensions) and assumptions, and for authors a panel to edit them.
 */
export function SpacetimeBlockView({ node, editor, updateAttributes, selected }: ReactNodeViewProps) {
  const attrs = node.attrs as SpacetimeBlockAttributes;
  const [editing, setEditing] = useState(false);
  const [opened, setOpened] = useState<"curvature" | "orbits" | null>(null);
  const editable = editor.isEditable;
  return (
    <NodeViewWrapper
      as="section"
      aria-label={`Spacetime block${attrs.name ? `: ${attrs.name}` : ""}`}
      className={`my-6 rounded-lg border bg-paper-deep/60 px-5 py-4 ${selected ? "border-accent" : "border-paper-edge"}`}
      data-block-id={attrs.id ?? undefined}
    >
      <div contentEditable={false}>
        <header className="flex flex-wrap items-baseline justify-between gap-2">
          <p className="font-sans text-xs font-semibold uppercase tracking-wide text-accent">
            Spacetime block{attrs.name ? <span className="ml-2 normal-case tracking-normal text-ink">{attrs.name}</span> : null}
          </p>
          <span className="flex flex-wrap gap-2">
            <button type="button" onClick={() => setOpened("curvature")} className="rounded border border-paper-edge px-2 py-0.5 font-sans text-xs hover:bg-paper">
              Curvature sheet
            </button>
            <button type="button" onClick={() => setOpened("orbits")} className="rounded border border-paper-edge px-2 py-0.5 font-sans text-xs hover:bg-paper">
              Orbit panel
            </button>
            {editable && !editing ? (
              <button type="button" onClick={() => setEditing(true)} className="rounded border border-paper-edge px-2 py-0.5 font-sans text-xs hover:bg-paper">
                Edit declarations
              </button>
            ) : null}
          </span>
        </header>
        <div className="mt-2 overflow-x-auto">
          {attrs.lineElement ? <Latex source={attrs.lineElement} display /> : <p className="font-sans text-sm italic text-ink-muted">No line element yet.</p>}
        </div>
        <div className="grid items-start gap-x-6 md:grid-cols-2">
          <SymbolTable caption="Coordinates" symbols={attrs.coordinates} />
          <SymbolTable caption="Constants" symbols={attrs.constants} />
        </div>
        {attrs.assumptions.length ? (
          <div className="mt-2">
            <p className="font-sans text-xs font-medium uppercase tracking-wide text-ink-muted">Assumptions</p>
            <ul className="flex flex-wrap gap-x-5 text-sm">
              {attrs.assumptions.map((a) => (
                <li key={a}>
                  <Latex source={a} />
                </li>
              ))}
            </ul>
          </div>
        ) : null}
        <p className="mt-2 font-sans text-xs text-ink-muted">
          Dots are derivatives by <Latex source={attrs.parameter || "\\tau"} />. Steps below this block, up to the next one, are checked in its context.
        </p>
        {editing ? (
          <SpacetimeBlockForm
            attrs={attrs}
            onCancel={() => setEditing(false)}
            onSave={(changes) => {
              updateAttributes(changes);
              setEditing(false);
            }}
          />
        ) : null}
        {opened === "curvature" ? <CurvatureSheet block={attrs} onClose={() => setOpened(null)} /> : null}
        {opened === "orbits" ? <OrbitPanel block={attrs} onClose={() => setOpened(null)} /> : null}
      </div>
    </NodeViewWrapper>
  );
}
