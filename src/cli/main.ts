#!/usr/bin/env node
/**
 * The `driftcell` command: DRIFT formulas without a spreadsheet program.
 * Subcommands: calc (one formula or many), recalc (a whole .xlsx workbook), demo
 * (writes a demo workbook). Errors end in one line on stderr, never a stack
 * trace; exit statuses are listed in the help.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Command, CommanderError } from 'commander';
import { runCalc, type CalcOptions } from './calc';
import { MAX_DIGITS, MIN_DIGITS } from './format';
import { DEFAULT_DEMO_FILE, runDemo } from './demo';
import { CliFailure, EXIT_CANNOT_RUN, EXIT_OK, EXIT_RESULT_ERROR, PROCESS_OUTPUT, type Output } from './failure';
import { runRecalc } from './recalc';

function packageVersion(): string {
  try {
    // dist/node/cli/main.js → package.json at the package root.
    const text = readFileSync(join(__dirname, '..', '..', '..', 'package.json'), 'utf8');
    return (JSON.parse(text) as { version?: string }).version ?? 'unknown';
  } catch {
    return 'unknown';
  }
}

const EXIT_STATUS_HELP = `
Exit status:
  ${EXIT_OK}  done
  ${EXIT_RESULT_ERROR}  calc: a formula's whole result is an error (every element of it, for a spill);
     recalc: the copy was written, but some formula cells were kept unrecalculated
  ${EXIT_CANNOT_RUN}  the command could not run: wrong usage, a missing or unreadable workbook,
     or an output that would replace the input or an existing file`;

const CALC_HELP = `
The leading "=" is optional. Quote each formula for your shell. A formula that
begins with "-" needs "--" before it (driftcell calc -- '-1*DRIFT.INTRINSIC(300)').
A formula is evaluated without a workbook: a reference to cells (A1, B2:C9,
A:A, Sheet1!A1) is refused with #REF!; use recalc for formulas that need cells.

One formula: a number at full precision (or --digits N significant digits), a
spill as tab-separated rows, an error as its code and message.

Several formulas (arguments, --file <file>, or "-" / --file - for stdin) print
one record per formula, one line each, in order:
  a value        13.53 · "text" in double quotes · TRUE · empty for a blank
  an error       #VALUE! temperature_K must be ≥ 20 K … (the whole result)
  a spill        an Excel array constant, {1,2;3,4}: "," between columns,
                 ";" between rows, errors by their code
In a file, each line is one formula; blank lines and lines starting with "#"
are skipped (write an error constant as =#N/A). Messages for errors inside a
spill and hints go to stderr as "<file> line N: …" or "formula N: …".
--batch prints the record form for a single formula too.

--digits N (1–17) prints numbers to N significant digits, as JavaScript's
toPrecision: 2.86e+19 for 28599999999999922000 with --digits 3, 13.500 for 13.5
with --digits 5 (exponent form when the exponent is ≥ N or < −6).

Exit status of calc: 0 no formula's whole result is an error; 1 at least one
formula's whole result is an error (every element, for a spill); 2 calc could
not run (wrong usage, an unreadable file, a file without formulas).

Examples:
  driftcell calc 'DRIFT.RESISTIVITY(1e15,"B")'
  driftcell calc --digits 4 'DRIFT.RESISTIVITY(1e15,"B")'
  driftcell calc '=DRIFT.RESISTIVITY({1e15;1e16},"phosphorus",{250,300,350})'
  driftcell calc 'DRIFT.SHEETRES(1,10)' 'DRIFT.SHEETRES(2,10)'
  driftcell calc --file formulas.txt > results.txt
  printf '%s\\n' 'DRIFT.INTRINSIC(300)' 'DRIFT.INTRINSIC(350)' | driftcell calc -`;

const RECALC_HELP = `
Every formula is recalculated (DRIFT functions, spreadsheet built-ins,
references between sheets) and stored with its result, DRIFT calls in the
form Excel stores for add-in functions. Excel shows the results; programs
without the add-in may not (see --values). A formula whose result spills is
written as a dynamic array over exactly its result; where a spill would cover
a filled cell, the formula shows #SPILL! and the cell keeps its content. Values,
formulas and cell formatting are kept; charts, pivot tables and macros are not
carried into the copy. Cells that show errors are listed on stderr.

With --values the copy is the values form, for programs without the DRIFT
add-in (LibreOffice Calc shows #NAME? for spilled DRIFT results otherwise):
every formula cell holds its result as a plain value, and a sheet "Formulas"
(or "Formulas 2" … when that name is taken) lists each formula's sheet, cell,
filled range and text. Nothing in the other sheets recalculates any more:
edit inputs in the live copy, not in this one.

The input is never changed: -o must name another file. An existing output is
only replaced with --force. The output is written to a temporary file in the
same folder first and then renamed into place.

Examples:
  driftcell recalc lots.xlsx -o lots-calculated.xlsx
  driftcell recalc lots.xlsx -o lots-values.xlsx --values`;

const DEMO_HELP = `
The demo is invented from start to end: a fictional pressure-sensor maker
checks incoming wafers against their ordered resistivity windows and sizes a
boron-diffused resistor from -40 to 150 °C. Every result cell holds a live
formula with its result stored; with --values every result is a plain value
instead and the formulas are listed on a sheet "Formulas" (for programs
without the DRIFT add-in). An existing file is never replaced.

Examples:
  driftcell demo -o sensor-demo.xlsx
  driftcell demo -o sensor-demo-values.xlsx --values`;

/**
 * Builds the command-line program; actions report their exit status through `setStatus`.
 *
 * @param output - where the commands print
 * @param setStatus - receives each command's exit status
 */
export function buildProgram(output: Output, setStatus: (status: number) => void): Command {
  const program = new Command();
  program
    .name('driftcell')
    .description(
      'Semiconductor transport physics (carrier densities, mobility, resistivity, doping …) as spreadsheet ' +
        'formulas, without a spreadsheet program: evaluate DRIFT formulas, recalculate an .xlsx workbook, ' +
        'or write a demo workbook.',
    )
    .version(packageVersion(), '-V, --version', 'print the version')
    .helpOption('-h, --help', 'show this help')
    .helpCommand('help [command]', 'show help for a command')
    .addHelpText('after', EXIT_STATUS_HELP)
    .showHelpAfterError('(run with --help to see how it is used)')
    .exitOverride()
    .configureOutput({
      writeOut: (text) => output.out(text.replace(/\n$/, '')),
      writeErr: (text) => output.err(text.replace(/\n$/, '')),
    });

  program
    .command('calc')
    .description('evaluate formulas and print their results, one formula or many (arguments, a file, stdin)')
    .argument('[formulas...]', 'formulas such as DRIFT.INTRINSIC(300) or =SUM(DRIFT.SHEETRES({1,2},10)); - reads them from stdin')
    .option('--file <file>', 'read formulas from a file, one a line (- for stdin)')
    .option('--digits <n>', `print numbers to n significant digits (${MIN_DIGITS}–${MAX_DIGITS}) instead of full precision`)
    .option('--batch', 'print one record per formula (the form for several formulas) even for one', false)
    .addHelpText('after', CALC_HELP)
    .action((formulas: string[], options: CalcOptions) => setStatus(runCalc(formulas, options, output)));

  program
    .command('recalc')
    .description('recalculate a workbook and write a copy with every result stored')
    .argument('<input>', 'the .xlsx workbook to read (it is not changed)')
    .requiredOption('-o, --output <file>', 'the .xlsx file to write')
    .option('-f, --force', 'replace the output file if it exists (never the input)', false)
    .option('--values', 'write every result as a plain value and list the formulas on a sheet "Formulas"', false)
    .addHelpText('after', RECALC_HELP)
    .action(async (input: string, options: { output: string; force: boolean; values: boolean }) =>
      setStatus(await runRecalc(input, options, output)),
    );

  program
    .command('demo')
    .description('write a demo workbook with invented data and print its resistor sweep')
    .option('-o, --output <file>', 'the .xlsx file to write', DEFAULT_DEMO_FILE)
    .option('--values', 'write every result as a plain value and list the formulas on a sheet "Formulas"', false)
    .addHelpText('after', DEMO_HELP)
    .action(async (options: { output: string; values: boolean }) =>
      setStatus(await runDemo(options.output, output, { values: options.values })),
    );

  program.commands.forEach((command) => {
    command.exitOverride().configureOutput({
      writeOut: (text) => output.out(text.replace(/\n$/, '')),
      writeErr: (text) => output.err(text.replace(/\n$/, '')),
    });
    command.helpOption('-h, --help', 'show this help');
  });
  return program;
}

/**
 * Runs the command line.
 *
 * @param args - the arguments after the program name
 * @param output - where to print (default stdout/stderr)
 * @returns the exit status
 * @example await main(['calc', 'DRIFT.SHEETRES(1,10)']) // prints 1000, returns 0
 */
export async function main(args: readonly string[], output: Output = PROCESS_OUTPUT): Promise<number> {
  let status = EXIT_OK;
  const program = buildProgram(output, (s) => (status = s));
  try {
    if (args.length === 0) {
      program.outputHelp();
      return EXIT_CANNOT_RUN;
    }
    await program.parseAsync([...args], { from: 'user' });
    return status;
  } catch (e) {
    if (e instanceof CommanderError) return e.exitCode === 0 ? EXIT_OK : EXIT_CANNOT_RUN;
    if (e instanceof CliFailure) {
      output.err(`driftcell: ${e.message}`);
      return e.exitCode;
    }
    const detail = e instanceof Error ? e.message : String(e);
    output.err(`driftcell: unexpected failure: ${detail.split('\n')[0]}`);
    return EXIT_CANNOT_RUN;
  }
}

if (require.main === module) {
  // A reader that stops early (driftcell demo | head) is not a failure.
  process.stdout.on('error', (e: NodeJS.ErrnoException) => {
    if (e.code === 'EPIPE') process.exit(EXIT_OK);
    throw e;
  });
  void main(process.argv.slice(2)).then((status) => {
    process.exitCode = status;
  });
}
