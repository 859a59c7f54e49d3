/**
 * What each directive holds, and so what becomes of it: prose bodies (admonitions, topics,
 * sidebars, containers) are read as part of their section; code, data, tables, images, tables of
 * contents and inclusions are skipped with a reason. Names are those of the specification and of
 * common documentation toolchains; a directive not listed here is skipped ('directive'), because
 * nothing says its body is prose.
 *
 * `args` and `options` say whether the directive takes arguments or options: they decide where
 * its content starts (the specification's directive block rules).
 */
import type { SkipReason } from '../../types';

export type DirectiveKind = 'prose' | 'titled' | 'quote' | 'figure' | 'table' | 'skip';

export interface DirectiveSpec {
  readonly kind: DirectiveKind;
  readonly args: boolean;
  readonly options: boolean;
  /** For kind 'skip': the reason reported. */
  readonly reason?: SkipReason;
}

const prose = (args: boolean, options: boolean): DirectiveSpec => ({ kind: 'prose', args, options });
const skip = (reason: SkipReason): DirectiveSpec => ({ kind: 'skip', args: true, options: true, reason });

const ADMONITION = prose(false, true);

const SPECS: Readonly<Record<string, DirectiveSpec>> = {
  attention: ADMONITION, caution: ADMONITION, danger: ADMONITION, error: ADMONITION, hint: ADMONITION,
  important: ADMONITION, note: ADMONITION, tip: ADMONITION, warning: ADMONITION,
  seealso: ADMONITION, todo: ADMONITION, compound: ADMONITION, glossary: ADMONITION, hlist: ADMONITION,
  only: prose(true, false), ifconfig: prose(true, false), class: prose(true, false),
  versionadded: prose(true, false), versionchanged: prose(true, false), deprecated: prose(true, false), versionremoved: prose(true, false),
  container: prose(true, true),
  admonition: { kind: 'titled', args: true, options: true },
  topic: { kind: 'titled', args: true, options: true },
  sidebar: { kind: 'titled', args: true, options: true },
  epigraph: { kind: 'quote', args: false, options: false },
  highlights: { kind: 'quote', args: false, options: false },
  'pull-quote': { kind: 'quote', args: false, options: false },
  figure: { kind: 'figure', args: true, options: true },
  table: { kind: 'table', args: true, options: true },
  'list-table': { kind: 'table', args: true, options: true },
  'csv-table': { kind: 'table', args: true, options: true },
  code: skip('code'), 'code-block': skip('code'), sourcecode: skip('code'), 'parsed-literal': skip('code'),
  math: skip('code'), literalinclude: skip('code'), productionlist: skip('code'), prompt: skip('code'),
  doctest: skip('code'), testcode: skip('code'), testoutput: skip('code'), testsetup: skip('code'), testcleanup: skip('code'),
  graphviz: skip('code'), graph: skip('code'), digraph: skip('code'), mermaid: skip('code'), plantuml: skip('code'), uml: skip('code'),
  blockdiag: skip('code'), seqdiag: skip('code'), actdiag: skip('code'), nwdiag: skip('code'), rackdiag: skip('code'), packetdiag: skip('code'),
  image: skip('image'),
  toctree: skip('tableOfContents'), contents: skip('tableOfContents'), autosummary: skip('tableOfContents'),
  raw: skip('html'),
  'line-block': skip('lineBlock'),
  meta: skip('metadata'), sectionauthor: skip('metadata'), moduleauthor: skip('metadata'), codeauthor: skip('metadata'),
};

const UNKNOWN = skip('directive');

/** Directive names are case-insensitive. */
export function directiveSpec(name: string): DirectiveSpec {
  return SPECS[name.toLowerCase()] ?? UNKNOWN;
}
