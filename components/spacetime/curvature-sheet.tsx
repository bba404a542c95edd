"use client";

import { useEffect, useMemo, useState } from "react";
import type { SpacetimeBlockAttributes } from "@/editor/spacetime-block";
import { ComputationStatus } from "./computation-status";
import { Latex } from "./latex";
import { SpacetimeDialog } from "./spacetime-dialog";
import { missingForRequest, spacetimeRequest } from "./spacetime-request";
import { useSpacetimeVerb } from "./use-spacetime-verb";

interface Symbolic { readonly latex: string; readonly expr: string }
interface Component extends Symbolic { readonly index: readonly number[] }

/** The `curvature` verb's answer (cas/api/curvature.ts). */
export interface CurvatureAnswer {
  readonly christoffel: readonly Component[];
  readonly riemann: readonly Component[];
  readonly ricci: readonly Component[];
  readonly ricciScalar: Symbolic;
  readonly einstein: readonly Component[];
  readonly kretschmann: Symbolic;
  readonly conventions: Readonly<Record<string, string | readonly string[]>>;
  readonly timings: Readonly<Record<string, number>>;
}

type Labeller = (index: readonly number[]) => string;

function ComponentTable({ title, definition, components, label, zeroNote }: { title: string; definition?: string; components: readonly Component[]; label: Labeller; zeroNote: string }) {
  return (
    <section aria-label={title} className="mt-6">
      <h3 className="font-serif text-lg">
        {title} <span className="font-sans text-sm text-ink-muted">({components.length} non-zero)</span>
      </h3>
      {definition ? (
        <p className="text-sm text-ink-soft">
          <Latex source={definition} />
        </p>
      ) : null}
      {components.length === 0 ? (
        <p className="mt-1 font-sans text-sm text-ink-soft">{zeroNote}</p>
      ) : (
        <table className="mt-2 w-full border-collapse text-sm">
          <thead className="sr-only">
            <tr>
              <th scope="col">Component</th>
              <th scope="col">Value</th>
            </tr>
          </thead>
          <tbody>
            {components.map((c) => (
              <tr key={c.index.join(",")} className="border-t border-paper-edge/70 align-middle">
                <th scope="row" className="w-40 py-1.5 pr-4 text-left font-normal">
                  <Latex source={label(c.index)} />
                </th>
                <td className="overflow-x-auto py-1.5">
                  <Latex source={`= ${c.latex}`} />
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}

function ScalarLine({ title, symbol, value, definition }: { title: string; symbol: string; value: Symbolic; definition?: string }) {
  return (
    <section aria-label={title} className="mt-6">
      <h3 className="font-serif text-lg">{title}</h3>
      {definition ? (
        <p className="text-sm text-ink-soft">
          <Latex source={definition} />
        </p>
      ) : null}
      <p className="mt-1 overflow-x-auto">
        <Latex source={`${symbol} = ${value.latex}`} display />
      </p>
    </section>
  );
}

function SheetBody({ sheet, coordinates }: { sheet: CurvatureAnswer; coordinates: readonly string[] }) {
  const x = (i: number) => coordinates[i] ?? String(i);
  const lower = (is: readonly number[]) => is.map(x).join("\\,");
  const c = sheet.conventions;
  const text = (k: string) => (typeof c[k] === "string" ? (c[k] as string) : "");
  return (
    <>
      <aside aria-label="Conventions and checks" className="rounded-md border border-paper-edge bg-paper-deep/70 px-4 py-3 font-sans text-sm">
        <p>
          <span className="font-semibold">Sign conventions: </span>
          {text("reference")}; signature {text("signature")}. Indices run over the coordinates <Latex source={coordinates.join(",\\ ")} /> in that order.
        </p>
        <p className="mt-2">
          <span className="font-semibold">Checked numerically: </span>
          each displayed form was checked numerically against the unsimplified result — {text("verification")}.
        </p>
      </aside>

      <ComponentTable
        title="Christoffel symbols"
        definition={text("christoffel")}
        components={sheet.christoffel}
        label={(i) => `\\Gamma^{${x(i[0])}}_{\\;${lower(i.slice(1))}}`}
        zeroNote="All Christoffel symbols vanish in these coordinates."
      />
      <p className="mt-1 font-sans text-xs text-ink-muted">
        Symmetric in the lower indices: <Latex source="\Gamma^a_{cb} = \Gamma^a_{bc}" /> is not listed again.
      </p>
      <ComponentTable
        title="Riemann tensor"
        definition={text("riemann")}
        components={sheet.riemann}
        label={(i) => `R^{${x(i[0])}}{}_{${lower(i.slice(1))}}`}
        zeroNote="The Riemann tensor vanishes: the spacetime is flat."
      />
      <p className="mt-1 font-sans text-xs text-ink-muted">
        Antisymmetric in the last pair: <Latex source="R^a{}_{bdc} = -R^a{}_{bcd}" /> is not listed again.
      </p>
      <ComponentTable title="Ricci tensor" definition={text("ricci")} components={sheet.ricci} label={(i) => `R_{${lower(i)}}`} zeroNote="The Ricci tensor vanishes: a vacuum solution (Ricci-flat)." />
      <ScalarLine title="Ricci scalar" symbol="R" value={sheet.ricciScalar} definition={text("ricciScalar")} />
      <ComponentTable title="Einstein tensor" definition={text("einstein")} components={sheet.einstein} label={(i) => `G_{${lower(i)}}`} zeroNote="The Einstein tensor vanishes." />
      <ScalarLine title="Kretschmann scalar" symbol="K" value={sheet.kretschmann} definition={text("kretschmann")} />

      <p className="mt-6 font-sans text-xs text-ink-muted">
        Computed in {Math.round(sheet.timings.total ?? 0)} ms in the worker
        {Object.entries(sheet.timings).filter(([k]) => k !== "total").length
          ? ` (${Object.entries(sheet.timings).filter(([k]) => k !== "total").map(([k, v]) => `${k} ${Math.round(v)} ms`).join(", ")})`
          : ""}
        .
      </p>
    </>
  );
}

/**
 * The curvature sheet of a spacetime block: the non-zero Christoffel symbols,
 * Riemann, Ricci and Einstein components, the Ricci and Kretschmann scalars,
 * with their conventions and how each displayed form was checked. Computed in a
 * Web Worker on opening; the author can cancel, and compute again after the
 * block changes.
 */
export function CurvatureSheet({ block, onClose }: { block: SpacetimeBlockAttributes; onClose: () => void }) {
  const { run, start, cancel } = useSpacetimeVerb<CurvatureAnswer>("curvature");
  const missing = missingForRequest(block);
  const request = useMemo(() => JSON.stringify(spacetimeRequest(block)), [block]);
  const [computedFor, setComputedFor] = useState<{ request: string; coordinates: string[] } | null>(null);

  const compute = () => {
    if (missing) return;
    setComputedFor({ request, coordinates: block.coordinates.map((c) => c.symbol) });
    void start(JSON.parse(request));
  };
  useEffect(() => {
    // eslint-disable-next-line react-hooks/set-state-in-effect -- opening the sheet starts the worker (an external system)
    compute();
    // eslint-disable-next-line react-hooks/exhaustive-deps -- computed once on opening; later changes offer "Compute again"
  }, []);

  const stale = computedFor !== null && computedFor.request !== request;
  return (
    <SpacetimeDialog
      title={`Curvature sheet${block.name ? ` — ${block.name}` : ""}`}
      subtitle={<Latex source={block.lineElement || "\\text{(no line element)}"} />}
      onClose={onClose}
    >
      {missing ? <p role="alert" className="font-sans text-sm text-alarm">{missing}</p> : null}
      <ComputationStatus run={run} what="the curvature sheet" onCancel={cancel} onRetry={compute} />
      {stale && run.state !== "running" ? (
        <p role="status" className="mb-3 flex flex-wrap items-center gap-3 rounded-md border border-paper-edge bg-paper-deep px-3 py-2 font-sans text-sm">
          The block has changed since this sheet was computed.
          <button type="button" onClick={compute} className="rounded border border-accent px-2 py-0.5 text-accent hover:bg-accent-wash">
            Compute again
          </button>
        </p>
      ) : null}
      {run.state === "done" && computedFor ? <SheetBody sheet={run.value} coordinates={computedFor.coordinates} /> : null}
    </SpacetimeDialog>
  );
}
