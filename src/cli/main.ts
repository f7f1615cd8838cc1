/**
 * The `fluxbook` command line. Exit codes: 0 done; 2 a refusal the user can act on (a missing,
 * broken or non-.xlsx input, an output that would replace the input or an existing file, a bad
 * option), printed as one line; 1 an internal fault.
 */
import { Command, CommanderError } from 'commander';
import packageJson from '../../package.json';
import { SAFETY_NOTE } from '../cells/metadata';
import type { FormulaResult } from '../engine/xlsx';
import { calc } from './calc';
import { demo, formatDemoSummary } from './demo';
import { UsageError } from './files';

/** The version npm publishes, read from package.json so the two cannot differ. */
const VERSION = packageJson.version;

/** What the error values of a run are, where two kinds say more than a count: cycles and unknown names. */
function errorKinds(results: FormulaResult[]): string {
  const code = (r: FormulaResult) => (r.value !== null && typeof r.value === 'object' ? r.value.error : undefined);
  const cycles = results.filter((r) => code(r) === '#CYCLE!').length;
  const names = results.filter((r) => code(r) === '#NAME?').length;
  const kinds = [
    cycles > 0 ? `${cycles} in a circular reference (#CYCLE!, stored as #VALUE!)` : '',
    names > 0 ? `${names} naming a function that does not exist (#NAME?)` : '',
  ].filter(Boolean);
  return kinds.length > 0 ? ` (${kinds.join('; ')}; --json shows each)` : '';
}

function program(): Command {
  const p = new Command('fluxbook')
    .description(`Recalculates .xlsx workbooks that use the XFMR transformer functions, without Excel.\n${SAFETY_NOTE}`)
    .version(VERSION)
    .exitOverride()
    .showHelpAfterError('(fluxbook --help lists the commands)')
    .addHelpText(
      'after',
      '\nExit codes: 0 done; 2 the input or an option was refused (one line says why); 1 an internal fault.\nEngine: HyperFormula, used under the GNU GPL v3.',
    );

  p.command('calc')
    .description('recalculate IN.xlsx and write its formulas with their computed values to a new workbook')
    .argument('<in>', 'the workbook to read (.xlsx); it is never written to')
    .requiredOption('--out <file>', 'the workbook to write (.xlsx); must not be the input')
    .option('--json', 'print every formula cell as {sheet, cell, formula, value} on stdout')
    .option('--overwrite', 'replace --out if it exists already')
    .addHelpText(
      'after',
      '\nCalls to XFMR functions are written the way Excel stores add-in calls (_xldudf_XFMR_EFF),\n' +
        'so Excel with the Fluxbook add-in recalculates them; values are stored for Excel before the\n' +
        'add-in loads and for other spreadsheets. A spilled result is stored as an array formula over\n' +
        'its range. The output is written to a temporary file beside it and renamed when complete.\n' +
        'A progress bar appears on stderr for workbooks of more than 50,000 formulas or a profile\n' +
        'longer than 8,760 steps, when stderr is a terminal.\n' +
        'Refused before reading (exit 2): a package cut short, one that would unpack to more than\n' +
        '1 GiB (500 MiB a part) or unpacks past what it declares, and a workbook too large for the\n' +
        'memory Node.js may use (NODE_OPTIONS=--max-old-space-size=MB allows more).',
    )
    .action(async (input: string, opts: { out: string; json?: boolean; overwrite?: boolean }) => {
      const summary = await calc(input, opts);
      if (opts.json) {
        process.stdout.write(`${JSON.stringify(summary.results, null, 1)}\n`);
      } else {
        const errors = summary.errors === 0 ? 'no errors' : `${summary.errors} with an error value${errorKinds(summary.results)}`;
        process.stdout.write(`${opts.out}: ${summary.formulas} formulas recalculated (${summary.ours} with XFMR functions), ${errors}\n`);
      }
    });

  p.command('demo')
    .description('write the Fernhill Works demo workbooks (a fictional campus), recalculated, and print a summary')
    .option('--out <dir>', 'folder to write the workbooks into (made if missing)', 'fluxbook-demo')
    .option('--overwrite', 'replace demo workbooks already in the folder')
    .action(async (opts: { out: string; overwrite?: boolean }) => {
      process.stdout.write(`${formatDemoSummary(await demo(opts))}\n`);
    });
  return p;
}

export async function main(argv: string[]): Promise<number> {
  try {
    await program().parseAsync(argv, { from: 'user' });
    return 0;
  } catch (error) {
    if (error instanceof CommanderError) {
      // Help and version end here too; commander has already printed what it had to say.
      return error.exitCode === 0 ? 0 : 2;
    }
    if (error instanceof UsageError) {
      process.stderr.write(`fluxbook: ${error.message}\n`);
      return 2;
    }
    const message = error instanceof Error ? error.message : String(error);
    process.stderr.write(`fluxbook: internal error: ${message}\n`);
    return 1;
  }
}
