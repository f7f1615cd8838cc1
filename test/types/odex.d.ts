/**
 * Types for the odex ODE solver, a dev dependency of the reference tests. The package ships its
 * TypeScript source as its types, and that source does not compile under this project's strict
 * settings; tsconfig.json maps 'odex' here so the compiler reads this declaration of the part
 * the tests use instead. At run time the package's own JavaScript is loaded.
 */
export type Derivative = (x: number, y: number[]) => number[];

export declare enum Outcome {
  Converged,
  MaxStepsExceeded,
  EarlyReturn,
}

export declare class Solver {
  constructor(n: number);
  absoluteTolerance: number | number[];
  relativeTolerance: number | number[];
  maxSteps: number;
  initialStepSize: number;
  maxStepSize: number;
  solve(f: Derivative, x: number, y0: number[], xEnd: number): { y: number[]; outcome: Outcome; nStep: number; xEnd: number };
}
