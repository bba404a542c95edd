export { ReadError, type ReadErrorCode } from "./errors";
export { normaliseName, MAX_DEPTH, MAX_SOURCE_LENGTH, type ReadOptions } from "./options";
export { readPlain, readPlainExpr, parsePlain, PLAIN_RESERVED_CALLS } from "./plain";
export { readLatex, readLatexExpr } from "./latex";
