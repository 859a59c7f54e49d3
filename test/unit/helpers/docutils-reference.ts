/**
 * Runs docutils (Debian package python3-docutils, the reference implementation of
 * reStructuredText) through test/tools/docutils-doctree.py: one Python process for a whole batch
 * of files. Finds the interpreter (TERSELY_PYTHON, else Debian's /usr/bin/python3, else python3 on
 * the PATH) and says why when docutils cannot run.
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';

export interface ReferenceNode {
  readonly kind: string;
  readonly text: string;
}

export interface ReferenceDocument {
  readonly title: string | null;
  readonly subtitle: string | null;
  readonly sections: readonly { readonly title: string; readonly depth: number }[];
  readonly prose: readonly ReferenceNode[];
  readonly other: readonly ReferenceNode[];
  readonly error?: string;
}

export interface Docutils {
  readonly python: string;
  readonly version: string;
  readonly module: string;
}

const SCRIPT = resolve(process.cwd(), 'test/tools/docutils-doctree.py');

function candidates(): string[] {
  if (process.env.TERSELY_PYTHON) return [process.env.TERSELY_PYTHON];
  return [...(existsSync('/usr/bin/python3') ? ['/usr/bin/python3'] : []), 'python3'];
}

/** The interpreter with docutils, or the reason there is none. */
export function findDocutils(): Docutils | { readonly missing: string } {
  const tried: string[] = [];
  for (const python of candidates()) {
    const probe = spawnSync(python, ['-c', 'import docutils, sys; print(docutils.__version__); print(docutils.__file__)'], { encoding: 'utf8' });
    if (probe.error) {
      tried.push(`${python}: not found`);
      continue;
    }
    if (probe.status !== 0) {
      tried.push(`${python}: no docutils module`);
      continue;
    }
    const [version, module] = probe.stdout.trim().split('\n');
    return { python, version: version!, module: module! };
  }
  return { missing: `${tried.join('; ')} (install with: apt-get install -y python3-docutils)` };
}

/** Reference doctrees of the files, keyed by path, from one docutils run. */
export function referenceDoctrees(docutils: Docutils, files: readonly string[]): Map<string, ReferenceDocument> {
  const run = spawnSync(docutils.python, [SCRIPT], { input: files.join('\n') + '\n', encoding: 'utf8', maxBuffer: 1 << 30 });
  if (run.status !== 0) throw new Error(`docutils run failed (${run.status}): ${run.stderr.slice(0, 2000)}`);
  const parsed = JSON.parse(run.stdout) as { files: Record<string, ReferenceDocument> };
  return new Map(Object.entries(parsed.files));
}

/**
 * The form both sides are compared in: letters and digits only, lower case, single spaces, with a
 * space at each end so that a substring test matches whole words. It removes what the two sides
 * write differently on purpose (markup characters, spacing around dropped footnote references,
 * "RFC 2822" shown as "rfc 2822").
 */
export function comparable(text: string): string {
  const words = text.normalize('NFC').toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? [];
  return ` ${words.join(' ')} `;
}
