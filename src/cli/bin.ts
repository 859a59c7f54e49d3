/** Entry point of the `tersely` binary. */
import { main } from './main';

main(process.argv.slice(2)).then(
  (code) => {
    process.exitCode = code;
  },
  (error: unknown) => {
    process.stderr.write(`tersely: internal error: ${error instanceof Error ? error.message : String(error)}\n`);
    process.exitCode = 70;
  },
);
