/**
 * The team's document templates named by `tersely.templateFiles`, read through the editor's file
 * system (so it works in the browser editor too) relative to the document's workspace folder.
 * The engine never picks a sentence found in one. A location that does not exist is passed over:
 * the default names the conventional pull-request and issue template places, which most
 * workspaces lack. A template that exists but cannot be read as text is reported, never hidden.
 */
import * as vscode from 'vscode';
import { formatForFileName, TEMPLATE_LIMITS, type DocumentFormat } from '../core/index';

export interface TemplateRead {
  readonly templates: readonly { readonly text: string; readonly format: DocumentFormat }[];
  /** One line per template that exists but could not be used. */
  readonly problems: readonly string[];
}

async function statOf(uri: vscode.Uri): Promise<vscode.FileStat | undefined> {
  try {
    return await vscode.workspace.fs.stat(uri);
  } catch {
    return undefined;
  }
}

/** A setting entry with a URI scheme names a place of its own; any other is relative to the workspace folder. */
const ABSOLUTE = /^[a-z][a-z0-9+.-]*:/i;

/** The document files an entry names: the file, or a folder's document files (sorted, not recursive). */
async function filesOf(entry: string, folder: vscode.Uri): Promise<vscode.Uri[]> {
  const uri = ABSOLUTE.test(entry) ? vscode.Uri.parse(entry) : vscode.Uri.joinPath(folder, entry);
  const stat = await statOf(uri);
  if (!stat) return [];
  if (stat.type & vscode.FileType.File) return [uri];
  if (!(stat.type & vscode.FileType.Directory)) return [];
  const names = (await vscode.workspace.fs.readDirectory(uri))
    .filter(([name, type]) => type & vscode.FileType.File && !name.startsWith('.') && formatForFileName(name) !== undefined)
    .map(([name]) => name)
    .sort();
  return names.map((name) => vscode.Uri.joinPath(uri, name));
}

export async function readTemplateFiles(entries: readonly string[], document: vscode.Uri): Promise<TemplateRead> {
  const folder = vscode.workspace.getWorkspaceFolder(document)?.uri;
  if (!folder || entries.length === 0) return { templates: [], problems: [] };
  const templates: { text: string; format: DocumentFormat }[] = [];
  const problems: string[] = [];
  const decoder = new TextDecoder('utf-8', { fatal: true });
  // All locations at once: in the browser editor each look-up is a round trip to the server, and
  // the default names ten places that mostly do not exist.
  const located = await Promise.all(entries.map((entry) => filesOf(entry, folder)));
  for (const files of located) {
    for (const uri of files) {
      const name = vscode.workspace.asRelativePath(uri, false);
      if (templates.length >= TEMPLATE_LIMITS.maxTemplates) {
        problems.push(`more than ${TEMPLATE_LIMITS.maxTemplates} templates: ${name} and later ones were not read`);
        return { templates, problems };
      }
      try {
        const bytes = await vscode.workspace.fs.readFile(uri);
        // A UTF-8 character is at most 3 bytes per UTF-16 unit: bigger files cannot fit the cap.
        if (bytes.length > 3 * TEMPLATE_LIMITS.maxTemplateChars) throw new Error(`larger than ${TEMPLATE_LIMITS.maxTemplateChars.toLocaleString('en-US')} characters`);
        const text = decoder.decode(bytes).replace(/^\uFEFF/, '');
        if (text.length > TEMPLATE_LIMITS.maxTemplateChars) throw new Error(`larger than ${TEMPLATE_LIMITS.maxTemplateChars.toLocaleString('en-US')} characters`);
        templates.push({ text, format: formatForFileName(uri.path)?.id ?? 'markdown' });
      } catch (error) {
        problems.push(`template ${name} was not used: ${error instanceof Error ? error.message : String(error)}`);
      }
    }
  }
  return { templates, problems };
}

/**
 * Template look-ups remembered per workspace folder and setting value until a file at one of the
 * named places is created, changed or deleted (a file-system watcher says so). In the browser
 * editor every look-up is a round trip to the server, and the default names ten places: without
 * this, each summary waited for them. Absolute URIs in the setting are not watched, so a setting
 * that names one is looked up every time.
 */
export class TemplateLookups implements vscode.Disposable {
  private readonly remembered = new Map<string, { readonly read: Promise<TemplateRead>; readonly watcher: vscode.Disposable }>();

  read(entries: readonly string[], document: vscode.Uri): Promise<TemplateRead> {
    const folder = vscode.workspace.getWorkspaceFolder(document)?.uri;
    if (!folder || entries.length === 0 || entries.some((entry) => ABSOLUTE.test(entry))) return readTemplateFiles(entries, document);
    const key = `${folder.toString()}\n${JSON.stringify(entries)}`;
    const known = this.remembered.get(key);
    if (known) return known.read;
    // Each place as named, and the files in it when it is a folder.
    const places = entries.map((entry) => entry.replace(/\/+$/, '')).flatMap((place) => [place, `${place}/*`]);
    const watcher = vscode.workspace.createFileSystemWatcher(new vscode.RelativePattern(folder, `{${places.join(',')}}`));
    const forget = () => this.forget(key);
    const listeners = [watcher, watcher.onDidCreate(forget), watcher.onDidChange(forget), watcher.onDidDelete(forget)];
    const read = readTemplateFiles(entries, document);
    this.remembered.set(key, { read, watcher: vscode.Disposable.from(...listeners) });
    read.catch(forget);
    return read;
  }

  private forget(key: string): void {
    this.remembered.get(key)?.watcher.dispose();
    this.remembered.delete(key);
  }

  dispose(): void {
    for (const key of [...this.remembered.keys()]) this.forget(key);
  }
}
