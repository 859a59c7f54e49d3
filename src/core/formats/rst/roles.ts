/**
 * The visible text of interpreted text with a role (`:role:`content``).
 *
 * - Roles that show their content as it is (emphasis, literal, code, subscript, abbreviation, the
 *   default role, and the text-showing roles of documentation toolchains such as `:kbd:`, `:file:`,
 *   `:command:`): the content.
 * - `:pep:` / `:rfc:`: the role name and the number ("rfc 2822"), so the words stay those of the
 *   source.
 * - Every other role, including domain roles (`:py:func:`) and project-specific roles
 *   (`:oslo.config:option:`): cross-reference conventions — `title <target>` shows the title,
 *   a leading `!` is dropped and `~a.b.c` shows `c`.
 */
import type { Piece } from './inline';

const CONTENT_ROLES = new Set([
  '', 'emphasis', 'strong', 'literal', 'code', 'subscript', 'sub', 'superscript', 'sup', 'title-reference', 'title', 't',
  'abbreviation', 'ab', 'acronym', 'ac', 'math', 'raw',
  'kbd', 'file', 'samp', 'command', 'program', 'makevar', 'mailheader', 'mimetype', 'newsgroup', 'regexp', 'dfn',
  'guilabel', 'menuselection', 'manpage',
]);

const NUMBERED_ROLES = new Set(['pep', 'pep-reference', 'rfc', 'rfc-reference']);

/** `title <target>` (the target may not be empty of a closing bracket; an escaped `<` does not count). */
const EXPLICIT_TITLE = /^([\s\S]+?)\s*(?<!\x00)<[\s\S]*>$/;

/**
 * Pieces for the content `w[from, to)` of a role named `role` (written at `roleAt`, -1 for the
 * default role).
 */
export function roleText(role: string, roleAt: number, w: string, from: number, to: number): Piece[] {
  const name = role.toLowerCase();
  const piece = (a: number, b: number): Piece => ({ from: a, to: b, literal: false, kind: 'interpreted' });
  if (CONTENT_ROLES.has(name)) return [piece(from, to)];
  if (NUMBERED_ROLES.has(name)) {
    const hash = w.indexOf('#', from);
    const end = hash >= 0 && hash < to ? hash : to;
    const dash = name.indexOf('-');
    const nameEnd = roleAt + (dash >= 0 ? dash : role.length);
    // Pieces stay in source order: `2822`:rfc: gives "2822 rfc".
    if (roleAt > from) return [piece(from, end), { ...piece(roleAt, nameEnd), spaceBefore: true }];
    return [piece(roleAt, nameEnd), { ...piece(from, end), spaceBefore: true }];
  }
  const content = w.slice(from, to);
  const explicit = EXPLICIT_TITLE.exec(content);
  if (explicit !== null) return [piece(from, from + explicit[1]!.length)];
  let start = from;
  if (w[start] === '!') start++;
  if (w[start] === '~') {
    start++;
    const dot = w.lastIndexOf('.', to - 1);
    if (dot >= start) start = dot + 1;
  }
  return start < to ? [piece(start, to)] : [piece(from, to)];
}
