import { runCli } from './runCli';

// The reader of a pipe went away (`returnrate returns x --n 8 | head`): stop quietly, as Unix tools
// do, instead of crashing on the unhandled 'error' event with a stack trace.
// Any other failure of standard output outside a command's own writes still ends in one line.
process.stdout.on('error', (error: NodeJS.ErrnoException) => {
  if (error.code === 'EPIPE') process.exit(0);
  process.stderr.write(`returnrate: standard output: ${error.message}\n`);
  process.exit(1);
});

process.exitCode = await runCli(process.argv.slice(2), { stdout: process.stdout, stderr: process.stderr });
