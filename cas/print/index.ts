export { toLatex, type LatexPrintOptions } from "./latex";
export { toPlain } from "./plain";
export { latexName } from "./latex-names";
