#!/usr/bin/env python3
"""Reference doctrees from docutils (Debian package python3-docutils), for Tersely's rst test.

Reads file paths, one per line, on standard input; writes one JSON object to standard output:

    {"docutils": "0.19", "files": {PATH: {"title": str|null, "subtitle": str|null,
      "sections": [{"title": str, "depth": int}],
      "prose": [{"kind": str, "text": str}],
      "other": [{"kind": str, "text": str}]}}}

Each file is parsed by the docutils reStructuredText parser; of the transforms only the document
title promotion (DocTitle) is applied, so substitution references, footnote references and targets
stay as written. "prose" holds the whitespace-normalized text of every paragraph, definition list
term and figure caption that is not inside a non-prose element (literal block, comment, target,
table, field list, option list, line block, footnote, citation, system message, ...); "kind" names
the nearest enclosing list item / definition / admonition / caption / section. "other" holds the
text of the non-prose elements, by element name, to explain disagreements.

Roles and directives docutils does not define (those of documentation toolchains) are registered
here with the conventions the Tersely reader uses: unknown roles show their visible text
(`title <target>` gives the title, `~a.b.c` gives `c`); directives whose body is prose in those
toolchains (seealso, todo, only, versionadded, ...) parse their content; code directives
(code-block, sourcecode, literalinclude) give a literal block. Other unknown directives stay
unknown: docutils reports them as errors, which are not prose.
"""

import json
import re
import sys

import docutils
from docutils import nodes, utils
from docutils.frontend import get_default_settings
from docutils.parsers.rst import Directive, Parser, directives, roles
from docutils.transforms.frontmatter import DocTitle

EXPLICIT_TITLE = re.compile(r'^(.+?)\s*(?<!\x00)<(.*?)>$', re.DOTALL)
CONTENT_ROLES = {'kbd', 'file', 'samp', 'command', 'program', 'makevar', 'mailheader', 'mimetype',
                 'newsgroup', 'regexp', 'dfn', 'guilabel', 'menuselection', 'manpage'}


def visible_role(name, rawtext, text, lineno, inliner, options=None, content=None):
    """Cross-reference conventions: `title <target>` → title, `!x` → x, `~a.b.c` → c."""
    shown = utils.unescape(text)
    if name.lower() not in CONTENT_ROLES:
        match = EXPLICIT_TITLE.match(text)
        if match:
            shown = utils.unescape(match.group(1))
        else:
            if shown.startswith('!'):
                shown = shown[1:]
            if shown.startswith('~'):
                shown = shown[1:].rpartition('.')[2] or shown[1:]
    return [nodes.inline(rawtext, shown)], []


_standard_role = roles.role


def role_with_fallback(role_name, language_module, lineno, reporter):
    found, messages = _standard_role(role_name, language_module, lineno, reporter)
    if found is None:
        return (lambda *args, **kwargs: visible_role(role_name, *args[1:], **kwargs)), []
    return found, messages


roles.role = role_with_fallback


class ProseContainer(Directive):
    """Content parsed as body elements (arguments, if any, are not shown)."""
    optional_arguments = 1
    final_argument_whitespace = True
    has_content = True
    option_spec = {'class': directives.class_option, 'name': directives.unchanged,
                   'sorted': directives.flag, 'columns': directives.unchanged}

    def run(self):
        node = nodes.container()
        self.state.nested_parse(self.content, self.content_offset, node)
        return [node]


class SeeAlso(ProseContainer):
    optional_arguments = 0

    def run(self):
        node = nodes.admonition(classes=['seealso'])
        self.state.nested_parse(self.content, self.content_offset, node)
        return [node]


class CodeBlock(Directive):
    optional_arguments = 1
    final_argument_whitespace = True
    has_content = True
    option_spec = {'linenos': directives.flag, 'lineno-start': int, 'emphasize-lines': directives.unchanged,
                   'caption': directives.unchanged, 'name': directives.unchanged, 'class': directives.class_option,
                   'dedent': directives.unchanged, 'force': directives.flag, 'language': directives.unchanged}

    def run(self):
        text = '\n'.join(self.content)
        return [nodes.literal_block(text, text)]


for _name in ('only', 'ifconfig', 'versionadded', 'versionchanged', 'deprecated', 'versionremoved', 'glossary', 'hlist'):
    directives.register_directive(_name, ProseContainer)
directives.register_directive('seealso', SeeAlso)
directives.register_directive('todo', SeeAlso)
for _name in ('code-block', 'sourcecode', 'literalinclude'):
    directives.register_directive(_name, CodeBlock)

NOT_PROSE = (nodes.literal_block, nodes.doctest_block, nodes.comment, nodes.target, nodes.substitution_definition,
             nodes.table, nodes.field_list, nodes.docinfo, nodes.option_list, nodes.line_block, nodes.footnote,
             nodes.citation, nodes.system_message, nodes.raw, nodes.rubric, nodes.image, nodes.attribution,
             nodes.title, nodes.subtitle, nodes.math_block, nodes.pending)
DROPPED_INLINE = (nodes.footnote_reference, nodes.citation_reference, nodes.system_message, nodes.image)
KIND_OF = ((nodes.caption, 'caption'), (nodes.legend, 'legend'), (nodes.term, 'term'), (nodes.definition, 'definition'),
           (nodes.list_item, 'list_item'), (nodes.Admonition, 'admonition'), (nodes.topic, 'topic'),
           (nodes.sidebar, 'sidebar'), (nodes.block_quote, 'block_quote'), (nodes.section, 'section'))


def normalized(text):
    return ' '.join(text.split())


def inline_text(node):
    """Visible text of an element, footnote and citation references left out."""
    parts = []
    for child in node.children:
        if isinstance(child, DROPPED_INLINE):
            continue
        if isinstance(child, nodes.Text):
            parts.append(child.astext())
        else:
            parts.append(inline_text(child))
    return ''.join(parts)


def kind_of(node):
    while node is not None:
        for cls, name in KIND_OF:
            if isinstance(node, cls):
                return name
        node = node.parent
    return 'document'


def collect(node, prose, other, depth, sections):
    for child in node.children:
        if isinstance(child, nodes.section):
            title = child.next_node(nodes.title)
            sections.append({'title': normalized(inline_text(title)) if title else '', 'depth': depth + 1})
            collect(child, prose, other, depth + 1, sections)
        elif isinstance(child, NOT_PROSE):
            if not isinstance(child, (nodes.title, nodes.subtitle)):
                other.append({'kind': child.tagname, 'text': normalized(child.astext())})
        elif isinstance(child, (nodes.paragraph, nodes.term, nodes.caption)):
            prose.append({'kind': kind_of(child if isinstance(child, (nodes.term, nodes.caption)) else child.parent),
                          'text': normalized(inline_text(child))})
        elif isinstance(child, nodes.Element):
            collect(child, prose, other, depth, sections)


def doctree(path, settings):
    with open(path, encoding='utf-8-sig') as handle:
        source = handle.read()
    document = utils.new_document(path, settings)
    Parser().parse(source, document)
    DocTitle(document).apply()
    title = document.next_node(nodes.title) if len(document) and isinstance(document[0], nodes.title) else None
    subtitle = document[1] if len(document) > 1 and isinstance(document[1], nodes.subtitle) else None
    prose, other, sections = [], [], []
    collect(document, prose, other, 0, sections)
    return {'title': normalized(inline_text(title)) if title is not None else None,
            'subtitle': normalized(inline_text(subtitle)) if subtitle is not None else None,
            'sections': sections, 'prose': prose, 'other': other}


def main():
    settings = get_default_settings(Parser)
    settings.report_level = 5
    settings.halt_level = 5
    settings.warning_stream = False
    settings.file_insertion_enabled = False
    result = {}
    for line in sys.stdin:
        path = line.rstrip('\n')
        if not path:
            continue
        try:
            result[path] = doctree(path, settings)
        except Exception as error:  # a document docutils cannot parse is reported, not fatal
            result[path] = {'error': '%s: %s' % (type(error).__name__, error)}
    json.dump({'docutils': docutils.__version__, 'files': result}, sys.stdout)


if __name__ == '__main__':
    main()
