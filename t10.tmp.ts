import { calcBenchmark } from './bench/calc';
import { printTable } from './bench/harness';
calcBenchmark(Number(process.argv[2] ?? 100000)).then(printTable);
