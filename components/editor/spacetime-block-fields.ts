import type { DeclaredSymbol } from "@/editor/spacetime-block";

/** One declaration per line: `symbol : dimension : note` (dimension and note optional). */
export function symbolsToText(symbols: readonly DeclaredSymbol[]): string {
  return symbols.map((s) => [s.symbol, s.dimension, s.note].filter((part, i) => i === 0 || part).join(" : ")).join("\n");
}

export function textToSymbols(text: string): DeclaredSymbol[] {
  return text
    .split("\n")
    .map((line) => line.split(" : ").map((part) => part.trim()))
    .filter(([symbol]) => symbol)
    .map(([symbol, dimension = "", ...note]) => ({ symbol, dimension, ...(note.length && note.join(" : ") ? { note: note.join(" : ") } : {}) }));
}

export function linesToList(text: string): string[] {
  return text.split("\n").map((line) => line.trim()).filter(Boolean);
}
