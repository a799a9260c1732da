// The bench harness's surface: what the areas' benchmarks and the scripts that report them use.
export { callsPerSecond, measure, singleFigure, timingFigure, type BenchFigure, type BenchResult } from './measure.js';
