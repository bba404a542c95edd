// odex ships its TypeScript sources beside the built JS, and those sources do
// not compile under this repository's strict settings; TypeScript would check
// them the moment a .ts file imported "odex". This plain re-export (typed by
// odex-runtime.d.ts) keeps TypeScript out of node_modules/odex.
export { Solver } from "odex";
