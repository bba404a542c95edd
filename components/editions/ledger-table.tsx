import { renderLatex } from "@/editor/katex-render";

type Entry = {
  number: number;
  id: string;
  relation: string;
  justification: { kind: string; detail: string };
  verdict: "verified" | "refuted" | "undecided";
  method: { kind: string; detail?: string; points?: number; digits?: number };
  witness?: Record<string, string>;
};

const glyphs: Record<Entry["verdict"], string> = { verified: "✓", refuted: "✕", undecided: "?" };

function how(method: Entry["method"]): string {
  if (method.kind === "numeric") return `numeric at ${method.points} points, ${method.digits} digits — probabilistic, not a proof`;
  if (method.kind === "symbolic") return "symbolic";
  return method.detail ?? "not decided";
}

/** The check ledger of an edition: every step with the verdict it had at publication and how it was reached. */
export function LedgerTable({ ledger }: { ledger: readonly Entry[] }) {
  const tally = { verified: 0, refuted: 0, undecided: 0 };
  for (const entry of ledger) tally[entry.verdict] += 1;
  return (
    <div className="space-y-2">
      <p className="text-sm">
        {tally.verified} verified, {tally.undecided} undecided, {tally.refuted} refuted, of {ledger.length} steps.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Check ledger</caption>
          <thead className="border-b border-paper-edge text-ink-soft">
            <tr>
              <th scope="col" className="py-1.5 pr-3 font-medium">Step</th>
              <th scope="col" className="py-1.5 pr-3 font-medium">Relation</th>
              <th scope="col" className="py-1.5 pr-3 font-medium">Justification</th>
              <th scope="col" className="py-1.5 pr-3 font-medium">Verdict</th>
              <th scope="col" className="py-1.5 pr-3 font-medium">How</th>
            </tr>
          </thead>
          <tbody>
            {ledger.map((entry) => (
              <tr key={entry.id} className="border-b border-paper-edge align-top last:border-b-0">
                <td className="py-1.5 pr-3">({entry.number})</td>
                <td className="max-w-md overflow-x-auto py-1.5 pr-3">
                  <span role="math" aria-label={entry.relation} dangerouslySetInnerHTML={{ __html: renderLatex(entry.relation, false).html }} />
                </td>
                <td className="py-1.5 pr-3 italic">
                  {entry.justification.kind} {entry.justification.detail}
                </td>
                <td className="py-1.5 pr-3 font-medium">
                  <span aria-hidden="true">{glyphs[entry.verdict]} </span>
                  {entry.verdict}
                </td>
                <td className="py-1.5 pr-3 text-xs text-ink-soft">
                  {how(entry.method)}
                  {entry.witness ? `; sides differ at ${Object.entries(entry.witness).map(([k, v]) => `${k} = ${v}`).join(", ")}` : ""}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
