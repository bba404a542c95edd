import type { JSONContent } from "@tiptap/core";
import type { ReactNode } from "react";
import { renderLatex } from "@/editor/katex-render";

type LedgerLike = { id: string; number: number; verdict: string; method: { kind: string; points?: number } };

function Tex({ latex, display = false }: { latex: string; display?: boolean }) {
  const { html } = renderLatex(latex, display);
  return <span role="math" aria-label={latex} dangerouslySetInnerHTML={{ __html: html }} />;
}

const textOf = (node: JSONContent): string => (node.type === "text" ? (node.text ?? "") : (node.content ?? []).map(textOf).join(""));

function Inline({ nodes, numbers }: { nodes: JSONContent[] | undefined; numbers: ReadonlyMap<string, number> }) {
  return (
    <>
      {(nodes ?? []).map((node, i) => {
        if (node.type === "mathInline") return <Tex key={i} latex={String(node.attrs?.latex ?? "")} />;
        if (node.type === "stepRef") {
          const n = numbers.get(String(node.attrs?.stepId ?? ""));
          return <a key={i} href={n ? `#step-${n}` : undefined}>{n ? `(${n})` : "(step removed)"}</a>;
        }
        if (node.type === "hardBreak") return <br key={i} />;
        let out: ReactNode = node.text ?? "";
        for (const mark of node.marks ?? []) {
          if (mark.type === "bold") out = <strong>{out}</strong>;
          else if (mark.type === "italic") out = <em>{out}</em>;
          else if (mark.type === "code") out = <code>{out}</code>;
        }
        return <span key={i}>{out}</span>;
      })}
    </>
  );
}

/**
 * An edition's frozen document, rendered on the server with KaTeX: no editor, nothing to
 * change. Steps carry their number and their verdict from the check ledger.
 */
export function EditionContent({ content, ledger }: { content: JSONContent; ledger: readonly LedgerLike[] }) {
  const byId = new Map(ledger.map((entry) => [entry.id, entry]));
  const numbers = new Map(ledger.map((entry) => [entry.id, entry.number]));
  const block = (node: JSONContent, key: number): ReactNode => {
    const attrs = (node.attrs ?? {}) as Record<string, unknown>;
    switch (node.type) {
      case "heading":
        return attrs.level === 3 ? <h3 key={key} className="mt-5 font-serif text-lg font-semibold">{textOf(node)}</h3> : <h2 key={key} className="mt-6 font-serif text-xl font-semibold">{textOf(node)}</h2>;
      case "paragraph":
        return <p key={key} className="my-2"><Inline nodes={node.content} numbers={numbers} /></p>;
      case "mathDisplay":
        return <div key={key} className="my-3 overflow-x-auto"><Tex latex={textOf(node)} display /></div>;
      case "step": {
        const entry = byId.get(String(attrs.id ?? ""));
        return (
          <div key={key} id={entry ? `step-${entry.number}` : undefined} className="my-3 grid grid-cols-[3rem_minmax(0,1fr)_9rem] items-center gap-2">
            <span className="text-sm text-ink-soft">({entry?.number ?? "?"})</span>
            <div className="overflow-x-auto"><Tex latex={textOf(node)} display /></div>
            <span className="text-xs">
              {entry ? entry.verdict : "not in the ledger"}
              {entry?.method.kind === "numeric" ? " (numeric, probabilistic)" : ""}
              <br />
              <span className="italic text-ink-soft">{String(attrs.kind ?? "")} {String(attrs.detail ?? "")}</span>
            </span>
          </div>
        );
      }
      case "spacetimeBlock": {
        const symbols = (value: unknown) => (Array.isArray(value) ? value.map((s: { symbol?: string; dimension?: string }) => `${s.symbol ?? ""}${s.dimension ? ` (${s.dimension})` : ""}`) : []);
        return (
          <div key={key} className="my-4 rounded-md border border-paper-edge bg-paper-deep p-3">
            <p className="font-semibold">Spacetime: {String(attrs.name ?? "")}</p>
            {typeof attrs.lineElement === "string" && attrs.lineElement && <Tex latex={attrs.lineElement} display />}
            <p className="text-sm">Coordinates: {symbols(attrs.coordinates).join(", ")}</p>
            <p className="text-sm">Constants: {symbols(attrs.constants).join(", ")}</p>
            {Array.isArray(attrs.assumptions) && attrs.assumptions.length > 0 && (
              <p className="text-sm">
                Assumptions:{" "}
                {(attrs.assumptions as string[]).map((a, i) => (
                  <span key={i} className="mr-2"><Tex latex={a} /></span>
                ))}
              </p>
            )}
          </div>
        );
      }
      case "figure":
        return (
          <figure key={key} className="my-4 text-center">
            {attrs.format === "pdf" ? (
              <a href={`/api/attachments/${String(attrs.attachmentId)}`}>Figure (PDF)</a>
            ) : (
              // eslint-disable-next-line @next/next/no-img-element -- served by our own download route
              <img src={`/api/attachments/${String(attrs.attachmentId)}`} alt={String(attrs.caption || "Figure")} className="mx-auto max-h-96" />
            )}
            {typeof attrs.caption === "string" && attrs.caption && <figcaption className="text-sm">{attrs.caption}</figcaption>}
          </figure>
        );
      case "bulletList":
        return <ul key={key} className="list-disc pl-6">{(node.content ?? []).map((item, i) => <li key={i}>{(item.content ?? []).map(block)}</li>)}</ul>;
      case "orderedList":
        return <ol key={key} className="list-decimal pl-6">{(node.content ?? []).map((item, i) => <li key={i}>{(item.content ?? []).map(block)}</li>)}</ol>;
      case "blockquote":
        return <blockquote key={key} className="border-l-2 border-paper-edge pl-3">{(node.content ?? []).map(block)}</blockquote>;
      case "codeBlock":
        return <pre key={key} className="overflow-x-auto text-sm">{textOf(node)}</pre>;
      case "horizontalRule":
        return <hr key={key} />;
      default:
        return <div key={key}>{(node.content ?? []).map(block)}</div>;
    }
  };
  return <div className="notebook-prose">{(content.content ?? []).map(block)}</div>;
}
