/** What the in-editor tests can observe: the API `activate` returns. */
import type { Span } from '../core/index';
import type { TerselyContext } from './context';
import type { RuntimeReport } from './engine-hosts';
import type { Scope } from './summaries';
import type { ShownDigestView } from './digester';
import type { PanelAbstractCheck, PanelControls, PanelDigest, PanelSummary } from './messages';

export interface TerselyApi {
  inspect(uri: { toString(): string }): { id: number; version: number; scope: Scope; spans: Span[]; highlighted: boolean; warnings: number } | undefined;
  readonly live: boolean;
  readonly statusText: string;
  readonly rejectedPanelMessages: number;
  /** Engine hosts started so far for summaries. */
  readonly engineHosts: number;
  /** Templates (tersely.templateFiles) sent with the last summary request. */
  readonly templatesInUse: number;
  readonly runtime: RuntimeReport;
  /** How long `activate` took, measured inside it. */
  readonly activationMs: number;
  /** The panel webview's resource roots and command-link switch, once the panel has been shown. */
  readonly panelWebview: { roots: string[]; enableCommandUris: boolean; enableScripts: boolean } | undefined;
  /** What the panel was last sent to show. */
  readonly panelSummary: PanelSummary | undefined;
  readonly panelControls: PanelControls | undefined;
  /** The digest shown: its places (lines and "also in" links, by `target`) and the picked ones the editor highlights. */
  readonly digest: ShownDigestView | undefined;
  /** What the panel was last sent as the digest (null once dismissed). */
  readonly panelDigest: PanelDigest | null | undefined;
  /** What clicking a digest line or link in the panel does. */
  revealDigest(digestId: number, target: number): Promise<boolean>;
  /** What the digest's dismiss button in the panel does. */
  dismissDigest(): void;
  /** What the panel was last sent as the abstract check (null once dismissed). */
  readonly panelCheck: PanelAbstractCheck | null | undefined;
  /** What the abstract check's dismiss button in the panel does. */
  dismissCheck(): void;
}

export function testApi(context: TerselyContext, runtime: RuntimeReport, activationMs: number): TerselyApi {
  return {
    inspect(uri) {
      const shown = context.store.get(uri.toString());
      if (!shown) return undefined;
      return {
        id: shown.id,
        version: shown.version,
        scope: shown.scope,
        spans: shown.summary.sentences.map((pick) => pick.span),
        highlighted: shown.highlighted,
        warnings: shown.summary.warnings.length,
      };
    },
    get live() {
      return context.live.on;
    },
    get statusText() {
      return context.editorView.statusText;
    },
    get rejectedPanelMessages() {
      return context.panel.rejectedMessages;
    },
    get engineHosts() {
      return context.engine.startedHosts;
    },
    get templatesInUse() {
      return context.summarizer.templatesInUse;
    },
    runtime,
    activationMs,
    get panelWebview() {
      const options = context.panel.webviewOptions;
      if (!options) return undefined;
      return { roots: (options.localResourceRoots ?? []).map((uri) => uri.toString()), enableCommandUris: options.enableCommandUris === true, enableScripts: options.enableScripts === true };
    },
    get panelSummary() {
      return context.panel.shownSummary;
    },
    get panelControls() {
      return context.controls();
    },
    get digest() {
      return context.digester.shownDigest;
    },
    get panelDigest() {
      return context.panel.shownDigest;
    },
    revealDigest: (digestId, target) => context.digester.reveal(digestId, target),
    dismissDigest: () => context.digester.dismiss(),
    get panelCheck() {
      return context.panel.shownCheck;
    },
    dismissCheck: () => context.abstractCheck.dismiss(),
  };
}
