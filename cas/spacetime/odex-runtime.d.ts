/** The part of odex's Solver (Hairer & Wanner's ODEX, Gragg–Bulirsch–Stoer) the orbit integrators use. */
export declare class Solver {
  constructor(n: number);
  absoluteTolerance: number | number[];
  relativeTolerance: number | number[];
  denseOutput: boolean;
  maxSteps: number;
  solve(
    f: (x: number, y: number[]) => number[],
    x: number,
    y0: number[],
    xEnd: number,
    solOut?: (n: number, xOld: number, x: number, y: number[], dense?: (component: number, x: number) => number) => boolean | void,
  ): { y: number[]; outcome: number; nStep: number; xEnd: number };
}
