"use client";

import type { CheckAnswer, CheckMethod, DimensionReport } from "@/cas/check/protocol";
import { verdictWord, type StepVerdict } from "@/editor/step-verdicts";

type Word = ReturnType<typeof verdictWord>;

const tone: Record<Word, string> = {
  verified: "text-accent",
  refuted: "text-alarm",
  undecided: "text-[#7a5a12]",
  pending: "text-ink-muted",
  "not checked": "text-ink-muted",
};

/** Each verdict has its own shape, so it reads without colour: ring+tick, diamond+cross, triangle+?, dotted ring, bar. */
export function VerdictShape({ word, className = "" }: { word: Word; className?: string }) {
  const common = { width: 16, height: 16, viewBox: "0 0 16 16", "aria-hidden": true, className: `shrink-0 ${className}` } as const;
  switch (word) {
    case "verified":
      return (
        <svg {...common}>
          <circle cx="8" cy="8" r="6.5" fill="none" stroke="currentColor" strokeWidth="1.5" />
          <path d="M5 8.2l2 2 4-4.4" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" strokeLinejoin="round" />
        </svg>
      );
    case "refuted":
      return (
        <svg {...common}>
          <path d="M8 1.2L14.8 8 8 14.8 1.2 8z" fill="currentColor" />
          <path d="M6 6l4 4M10 6l-4 4" stroke="#fbf8f1" strokeWidth="1.6" strokeLinecap="round" />
        </svg>
      );
    case "undecided":
      return (
        <svg {...common}>
          <path d="M8 1.8L14.6 13.9H1.4z" fill="none" stroke="currentColor" strokeWidth="1.5" strokeLinejoin="round" />
          <path d="M8 6v3.6" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
          <circle cx="8" cy="11.7" r="0.9" fill="currentColor" />
        </svg>
      );
    case "pending":
      return (
        <svg {...common}>
          <circle cx="8" cy="8" r="6" fill="none" stroke="currentColor" strokeWidth="1.5" strokeDasharray="2.2 2.2" />
        </svg>
      );
    default:
      return (
        <svg {...common}>
          <path d="M3 8h10" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
        </svg>
      );
  }
}

/** Says how the checker knows, plainly; a numeric verdict is labelled probabilistic. */
export function describeMethod(method: CheckMethod, verdict: CheckAnswer["verdict"]): string {
  if (method.kind === "symbolic") return `Decided symbolically${method.detail ? ` (${method.detail})` : ""}.`;
  if (method.kind === "numeric") {
    const base = `numeric probing at ${method.points} random point${method.points === 1 ? "" : "s"} with ${method.digits} digits`;
    if (verdict === "verified") return `Probabilistic: both sides agree under ${base}. Likely, not proved.`;
    if (verdict === "refuted") return `Found by ${base}: the sides differ at the witness below.`;
    return `Tried ${base}${method.detail ? ` (${method.detail})` : ""}.`;
  }
  return method.detail;
}

function WitnessList({ witness }: { witness: Readonly<Record<string, string>> }) {
  return (
    <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-2 font-mono text-xs">
      {Object.entries(witness).map(([name, value]) => (
        <div key={name} className="contents">
          <dt>{name}</dt>
          <dd className="break-all">= {value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** A report with a term of unknown dimension cannot say the terms disagree, only that it is incomplete. */
export function dimensionsDisagree(report: DimensionReport): boolean {
  if (report.consistent) return false;
  return report.odd !== undefined || report.terms.every((term) => term.dimension !== null);
}

function DimensionNote({ report }: { report: DimensionReport }) {
  if (report.consistent) return <p className="mt-1">Dimension audit: every term agrees.</p>;
  if (!dimensionsDisagree(report)) {
    const unknown = report.terms.filter((term) => term.dimension === null).map((term) => term.latex);
    return (
      <p className="mt-1">
        Dimension audit incomplete: no declared dimension for <code className="font-mono">{unknown.join(", ")}</code>. Declare the symbols in the spacetime block to audit them.
      </p>
    );
  }
  const odd = report.odd !== undefined ? report.terms[report.odd] : undefined;
  return (
    <div className="mt-1">
      <p className="font-medium">Dimension audit: terms disagree{odd ? <> — odd term <code className="font-mono">{odd.latex}</code> has {odd.dimension ?? "an unknown dimension"}.</> : "."}</p>
      <ul className="mt-0.5 font-mono text-xs">
        {report.terms.map((term, i) => (
          <li key={i} className={i === report.odd ? "font-semibold text-alarm" : ""}>
            {term.latex}: {term.dimension ?? "unknown"}
          </li>
        ))}
      </ul>
    </div>
  );
}

function headline(verdict: StepVerdict | null): string {
  if (!verdict) return "Not yet checked.";
  switch (verdict.state) {
    case "pending":
      return verdict.previous ? `Checking again (was ${verdict.previous.verdict}).` : "Waiting for the checker.";
    case "failed":
      return `The checker could not read this step: ${verdict.error.message}`;
    case "not-checked":
      return verdict.reason;
    case "answered":
      return verdict.answer.reason ?? "";
  }
}

/**
 * The verdict of one step as it appears in the margin: a shape and a word, then in a
 * disclosure how the checker knows (numeric probing is called probabilistic), the witness
 * of a refuted step, the reason of an undecided one and the dimension audit.
 */
export function VerdictMark({ verdict, stepNumber }: { verdict: StepVerdict | null; stepNumber: number | null }) {
  const word = verdictWord(verdict ?? undefined);
  const answer = verdict?.state === "answered" ? verdict.answer : null;
  // A numeric "verified" is evidence, not proof; a numeric "refuted" comes with its witness.
  const numeric = answer?.method.kind === "numeric" && answer.verdict === "verified";
  const line = headline(verdict);
  return (
    <div className={`text-sm leading-snug ${tone[word]}`} role="status" aria-live="polite">
      <p className="flex items-center gap-1.5 font-sans font-medium">
        <VerdictShape word={word} />
        <span>
          <span className="sr-only">Step {stepNumber ?? ""}: </span>
          {word}
          {numeric ? <span className="font-normal text-ink-muted"> · probabilistic</span> : null}
        </span>
      </p>
      {answer?.verdict === "refuted" && answer.witness ? (
        <div className="mt-0.5 font-sans text-xs text-ink-soft">
          <p>Sides differ at:</p>
          <WitnessList witness={answer.witness} />
        </div>
      ) : null}
      {(answer || line) && (
        <details className="mt-0.5 font-sans text-ink-soft">
          <summary className="cursor-pointer text-xs text-ink-muted">why</summary>
          <div className="mt-1 text-xs">
            {line ? <p>{line}</p> : null}
            {answer ? <p className="mt-1">{describeMethod(answer.method, answer.verdict)}</p> : null}
            {answer?.dimensions ? <DimensionNote report={answer.dimensions} /> : null}
          </div>
        </details>
      )}
      {answer?.dimensions && dimensionsDisagree(answer.dimensions) ? (
        <p className="mt-0.5 font-sans text-xs text-alarm">
          <span aria-hidden="true">⚠ </span>dimensions disagree
        </p>
      ) : null}
    </div>
  );
}
