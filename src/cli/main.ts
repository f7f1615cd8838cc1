/**
 * The `fluxbook` command line. Exit codes: 0 done; 2 a refusal the user can act on (a missing,
 * broken or non-.xlsx input, an output that would replace the input or an existing file, a bad
 * option), printed as one line; 1 an internal fault.
 */
import { Command, CommanderError } from 'commander';
import packageJson from '../../package.json';
import { SAFETY_NOTE } from '../cells/metadata';
import { calc, type CalcSummary } from './calc';
import { installSignalHandlers, UsageError } from './files';
import { restoreTerminal } from './progress';

/** The version npm publishes, read from package.json so the two cannot differ. */
const VERSION = packageJson.version;

/** Known error codes and what they mean, for the summary line. */
const CODE_NOTES: Record<string, string> = {
  '#CYCLE!': 'a circular reference, stored as #VALUE!',
  '#NAME?': 'a function or name that does not exist here',
  '#SPILL!': 'a result with no room to spill, stored as #VALUE!',
  '#ERROR!': 'a formula that could not be read, stored as #VALUE!',
};

/** One line that sums a run up: formulas, XFMR formulas, and every error value by code (cells of spills included). */
export function summaryLine(out: string, s: CalcSummary): string {
  const head = `${out}: ${s.formulas} formula${s.formulas === 1 ? '' : 's'} recalculated (${s.ours} with XFMR functions)`;
  if (s.errors === 0) return `${head}, no error values`;
  const codes = Object.entries(s.errorCodes)
    .sort((a, b) => b[1] - a[1])
    .map(([code, n]) => `${n} ${code}${CODE_NOTES[code] ? ` (${CODE_NOTES[code]})` : ''}`)
    .join(', ');
  return `${head}, ${s.errors} error value${s.errors === 1 ? '' : 's'}: ${codes}; ${s.oursErrors} of them from XFMR formulas; --json shows each`;
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
    .argument('[out]', 'the workbook to write, as an alternative to --out')
    .option('--out <file>', 'the workbook to write (.xlsx); must not be the input')
    .option('--json', 'print every formula cell as {sheet, cell, formula, value} on stdout')
    .option('--values', 'write plain values instead of formulas (for spreadsheets without the add-in)')
    .option('--strict', 'exit with 3 when any XFMR result is an error value (the workbook is still written)')
    .option('--overwrite', 'replace the output if it exists already')
    .addHelpText(
      'after',
      '\nThe output is the input package with new values: every part (charts, images, comments,\n' +
        'tables, styles, extensions) is copied as it was; in the worksheets only the formula cells\n' +
        'and the cells of spilled results are rewritten. Calls to XFMR functions are written the way\n' +
        'Excel stores add-in calls (_xldudf_XFMR_EFF), so Excel with the Fluxbook add-in recalculates\n' +
        'them. A spilled result is written as an Excel dynamic array. With --values every formula is\n' +
        'replaced by its value. The output is written to a temporary file beside it and renamed when\n' +
        'complete. A summary goes to stderr, with every error value counted. A progress bar appears on\n' +
        'stderr for inputs of more than 1 MB when stderr is a terminal.\n' +
        'Refused before reading (exit 2): a package cut short, one that would unpack to more than\n' +
        '1 GiB (500 MiB a part) or unpacks past what it declares, and a workbook too large for the\n' +
        'memory Node.js may use (NODE_OPTIONS=--max-old-space-size=MB allows more).\n' +
        'Exit codes: 0 done; 2 refused; 3 with --strict, an XFMR result is an error value; 130 interrupted.',
    )
    .action(async (input: string, second: string | undefined, opts: { out?: string; json?: boolean; overwrite?: boolean; values?: boolean; strict?: boolean }) => {
      if (second !== undefined && opts.out !== undefined) {
        throw new UsageError(`unexpected argument "${second}": the output is given with --out (${opts.out}); give one workbook to read`);
      }
      const out = opts.out ?? second;
      if (out === undefined) throw new UsageError('no output given: add --out OUT.xlsx (or name it after the input: fluxbook calc IN.xlsx OUT.xlsx)');
      installSignalHandlers(restoreTerminal);
      const summary = await calc(input, { ...opts, out });
      process.stderr.write(`${summaryLine(out, summary)}\n`);
      if (opts.json && summary.json !== undefined) await writeStdout(`${summary.json}\n`);
      if (opts.strict && summary.oursErrors > 0) exitCode = 3;
    });

  p.command('demo')
    .description('write the Fernhill Works demo workbooks (a fictional campus), recalculated, and print a summary')
    .option('--out <dir>', 'folder to write the workbooks into (made if missing)', 'fluxbook-demo')
    .option('--overwrite', 'replace demo workbooks already in the folder')
    .action(async (opts: { out: string; overwrite?: boolean }) => {
      // Loaded here: the demo's workbook writer is not needed by calc, which starts faster without it.
      const { demo, formatDemoSummary } = await import('./demo');
      process.stdout.write(`${formatDemoSummary(await demo(opts))}\n`);
    });
  return p;
}

let exitCode = 0;

/** Writes to stdout; a reader that went away (`| head`) ends the output quietly, not the run. */
function writeStdout(text: string): Promise<void> {
  return new Promise((resolve) => {
    process.stdout.write(text, () => resolve());
  });
}

let pipeWatched = false;

function quietOnClosedPipe(): void {
  if (pipeWatched) return;
  pipeWatched = true;
  process.stdout.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code === 'EPIPE') process.exit(exitCode);
    throw error;
  });
}

export async function main(argv: string[]): Promise<number> {
  exitCode = 0;
  quietOnClosedPipe();
  try {
    await program().parseAsync(argv, { from: 'user' });
    return exitCode;
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
