import type { ReactNode } from "react";

type NoticeKind = "info" | "success" | "problem";

// The kind is spelled out in words and marked by a glyph, so it never rests on colour alone.
const kinds: Record<NoticeKind, { word: string; glyph: string; box: string }> = {
  info: { word: "Note", glyph: "○", box: "border-paper-edge bg-paper-deep" },
  success: { word: "Done", glyph: "✓", box: "border-accent bg-accent-wash" },
  problem: { word: "Problem", glyph: "✕", box: "border-alarm bg-alarm-wash" },
};

export function Notice({ kind = "info", children }: { kind?: NoticeKind; children: ReactNode }) {
  const { word, glyph, box } = kinds[kind];
  return (
    <div role={kind === "problem" ? "alert" : "status"} className={`flex gap-2 rounded-md border px-3 py-2 text-sm ${box}`}>
      <span aria-hidden="true" className="font-semibold">
        {glyph}
      </span>
      <p>
        <span className="font-semibold">{word}: </span>
        {children}
      </p>
    </div>
  );
}
