/**
 * In-editor tests of the digest with the real `vscode` API: three invented files (test/e2e/fixtures/digest/,
 * copied into the workspace's digest/ folder by scripts/e2e.sh), digested as open editors and as a
 * folder; a line of the second file revealed at its exact range; dismissing forgets the digest.
 */
import assert from 'node:assert/strict';
import * as vscode from 'vscode';
import type { TerselyApi } from '../../../src/extension/api';
import type { ShownDigestView } from '../../../src/extension/digester';

const EXTENSION_ID = 'tersely.tersely';
const FILES = ['keeping.md', 'supplies.rst', 'visitors.txt'];

let api: TerselyApi;
let folder: vscode.Uri;

const uriOf = (name: string): vscode.Uri => vscode.Uri.joinPath(folder, name);

interface Outcome {
  readonly kind: string;
  readonly id?: number;
  readonly documents?: number;
  readonly sentences?: number;
}

describe('Tersely digest in the editor', function () {
  this.timeout(60_000);

  before(async () => {
    const extension = vscode.extensions.getExtension<TerselyApi>(EXTENSION_ID);
    assert.ok(extension, `${EXTENSION_ID} is installed`);
    api = await extension.activate();
    const root = vscode.workspace.workspaceFolders?.[0];
    assert.ok(root, 'a workspace folder is open');
    folder = vscode.Uri.joinPath(root.uri, 'digest');
  });

  afterEach(async () => {
    // Reverted first: an untitled document with text would stop closeAllEditors at a save prompt.
    await vscode.commands.executeCommand('workbench.action.files.revert');
    await vscode.commands.executeCommand('workbench.action.closeAllEditors');
  });

  it('digests the three open editors: lines from every file, each pointing at its own sentence', async () => {
    for (const name of FILES) await vscode.window.showTextDocument(await vscode.workspace.openTextDocument(uriOf(name)), { preview: false });
    const outcome = (await vscode.commands.executeCommand('tersely.digestOpenDocuments')) as Outcome;
    assert.equal(outcome.kind, 'shown', JSON.stringify(outcome));
    assert.equal(outcome.documents, 3);
    const digest = api.digest;
    assert.ok(digest && digest.id === outcome.id, 'the digest the command made is the one shown');
    assert.equal(digest.highlighted, true);
    for (const name of FILES) assert.ok(digest.picked.some((p) => p.uri === uriOf(name).toString()), `a line of ${name}`);
    assert.equal(digest.picked.length, outcome.sentences);
    // The panel was sent the same digest, by document in tab order.
    const panel = api.panelDigest;
    assert.ok(panel && panel.id === digest.id);
    assert.deepEqual(panel.documents.map((d) => d.file), FILES.map((name) => `digest/${name}`));
    // Every line's place holds that line's text in the file.
    for (const [k, doc] of panel.documents.entries()) {
      const text = (await vscode.workspace.openTextDocument(uriOf(FILES[k]!))).getText();
      for (const line of doc.sections.flatMap((s) => s.lines)) {
        const place: ShownDigestView['places'][number] = digest.places[line.target]!;
        assert.equal(place.uri, uriOf(FILES[k]!).toString());
        assert.ok(place.span, line.text);
        assert.equal(text.slice(place.span.start, place.span.end), line.text);
      }
    }
  });

  it('reveals a line of the second file: that file active, the selection exactly the sentence', async () => {
    for (const name of FILES) await vscode.window.showTextDocument(await vscode.workspace.openTextDocument(uriOf(name)), { preview: false });
    const outcome = (await vscode.commands.executeCommand('tersely.digestOpenDocuments')) as Outcome;
    assert.equal(outcome.kind, 'shown');
    // The first file is active afterwards, so the reveal has to switch editors.
    await vscode.window.showTextDocument(await vscode.workspace.openTextDocument(uriOf(FILES[0]!)), { preview: false });
    const second = api.panelDigest!.documents[1]!;
    const line = second.sections.flatMap((s) => s.lines).at(-1)!;
    const place = api.digest!.places[line.target]!;
    assert.ok(place.span);
    assert.equal(await api.revealDigest(outcome.id!, line.target), true);
    const editor = vscode.window.activeTextEditor;
    assert.ok(editor);
    assert.equal(editor.document.uri.toString(), uriOf(FILES[1]!).toString());
    const { document, selection } = editor;
    assert.equal(document.offsetAt(selection.start), place.span.start);
    assert.equal(document.offsetAt(selection.end), place.span.end);
    assert.equal(document.getText(selection), line.text);
  });

  it('digests a folder given as a URI (as the explorer passes it), the same three files in name order', async () => {
    const outcome = (await vscode.commands.executeCommand('tersely.digestFiles', folder, [folder])) as Outcome;
    assert.equal(outcome.kind, 'shown', JSON.stringify(outcome));
    assert.equal(outcome.documents, 3);
    assert.deepEqual(api.panelDigest!.documents.map((d) => d.file), [...FILES].sort().map((name) => `digest/${name}`));
    for (const name of FILES) assert.ok(api.digest!.picked.some((p) => p.uri === uriOf(name).toString()), `a line of ${name}`);
  });

  it('says so and changes nothing when no open editor is Markdown, reStructuredText or text', async () => {
    const before = api.digest?.id;
    await vscode.window.showTextDocument(await vscode.workspace.openTextDocument({ language: 'javascript', content: 'const lamp = "lit";\n' }));
    const outcome = (await vscode.commands.executeCommand('tersely.digestOpenDocuments')) as Outcome;
    assert.equal(outcome.kind, 'empty');
    assert.equal(api.digest?.id, before);
  });

  it('forgets the digest when it is dismissed: no places, the panel sent nothing to show', async () => {
    const outcome = (await vscode.commands.executeCommand('tersely.digestFiles', folder)) as Outcome;
    assert.equal(outcome.kind, 'shown');
    assert.ok(api.digest);
    api.dismissDigest();
    assert.equal(api.digest, undefined);
    assert.equal(api.panelDigest, null);
    assert.equal(await api.revealDigest(outcome.id!, 0), false, 'a dismissed digest reveals nothing');
  });
});
