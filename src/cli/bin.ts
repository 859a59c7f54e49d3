/** Entry point of the `tersely` binary. */
import { serveAsReaderThread } from './digest-threads';
import { main } from './main';

// `tersely summarize … | head -1`: the reader closed the pipe on purpose; stop quietly, as other
// filters do, instead of dying with an unhandled EPIPE.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code === 'EPIPE') process.exit(0);
    throw error;
  });
}

// A digest's reader threads run this same bundle.
if (!serveAsReaderThread()) runMain();

function runMain(): void {
  main(process.argv.slice(2)).then(
    (code) => {
      process.exitCode = code;
    },
    (error: unknown) => {
      process.stderr.write(`tersely: internal error: ${error instanceof Error ? error.message : String(error)}\n`);
      process.exitCode = 70;
    },
  );
}
