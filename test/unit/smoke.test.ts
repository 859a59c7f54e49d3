import assert from 'node:assert/strict';
import { fromMarkdown } from 'mdast-util-from-markdown';
import porter from 'natural/lib/natural/stemmers/porter_stemmer.js';
describe('smoke', () => { it('parses', () => { const t = fromMarkdown('# Hi\n\ntext'); assert.equal(t.children.length, 2); assert.equal(porter.stem('ponies'), 'poni'); }); });
