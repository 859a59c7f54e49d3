/**
 * A summary of a short invented note, made once when an engine host starts and thrown away: the
 * first real summary then finds the engine's code compiled and its word lists and model loaded
 * (about a fifth of a cold first summary of the 16 KB demo, measured in Node). A job that arrives
 * meanwhile waits for it, some tens of milliseconds.
 */
import { summarize } from '../core/index';

const NOTE = [
  '# Harbour ferry notes',
  '',
  'The night ferry leaves the harbour at ten. Tickets are sold on board, and the purser takes cards.',
  '',
  '## Bicycles',
  '',
  '- Bicycles ride free in summer.',
  '- The crossing takes forty minutes, and the crew checks the ropes first.',
  '',
].join('\n');

export function warmUpEngine(): void {
  try {
    summarize(NOTE.repeat(4));
  } catch {
    // Only a head start; the real job reports any problem.
  }
}
