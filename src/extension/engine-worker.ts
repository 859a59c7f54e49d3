/**
 * The engine's thread: runs summaries and abstract checks away from the extension host's main
 * thread so that a long document never freezes the editor. One job at a time; the client
 * cancels a job by terminating this thread. The model file is validated here, so the extension
 * bundle itself carries no engine code.
 */
import { parentPort } from 'node:worker_threads';
import { checkAbstract } from '../core/index';
import { loadModel } from '../core/index';
import { summarize } from '../core/index';
import type { EngineJob, EngineReply } from './engine-protocol';

function runJob(job: EngineJob): EngineReply {
  const started = performance.now();
  try {
    switch (job.kind) {
      case 'summarize': {
        const { model, ...options } = job.options;
        let modelProblem: string | undefined;
        let checkedModel: unknown;
        if (model !== undefined) {
          const loaded = loadModel(model);
          if (loaded.ok) checkedModel = loaded.model;
          else modelProblem = loaded.error;
        }
        const summary = summarize(job.text, checkedModel !== undefined ? { ...options, model: checkedModel } : options);
        // The extension has the text already; sending it back would only double the copy.
        const slim = { ...summary, document: { ...summary.document, text: '' } };
        return { id: job.id, ok: true, kind: 'summarize', summary: slim, elapsedMs: performance.now() - started, ...(modelProblem ? { modelProblem } : {}) };
      }
      case 'checkAbstract': {
        const report = checkAbstract(job.text, { format: job.options.format, language: job.options.language });
        return { id: job.id, ok: true, kind: 'checkAbstract', report, elapsedMs: performance.now() - started };
      }
    }
  } catch (error) {
    return { id: job.id, ok: false, error: error instanceof Error ? error.message : String(error) };
  }
}

parentPort?.on('message', (job: EngineJob) => {
  parentPort?.postMessage(runJob(job));
});
