/**
 * The engine request for the parsed option flags, shared by summarize and digest: the host-only
 * options name files (--model, --template), which are read here; the rest go to the engine as given.
 */
import { loadModelFile } from './model-file';
import { readTemplates } from './template-files';

export async function engineRequest(options: Readonly<Record<string, unknown>>): Promise<Record<string, unknown>> {
  const { modelFile, templateFiles, ...summaryOptions } = options;
  const request: Record<string, unknown> = { ...summaryOptions };
  if (typeof modelFile === 'string' && modelFile !== '') request.model = await loadModelFile(modelFile);
  const templates = await readTemplates(templateFiles as readonly string[] | undefined);
  if (templates.length > 0) request.templates = templates;
  return request;
}
