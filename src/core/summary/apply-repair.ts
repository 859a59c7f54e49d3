/**
 * Applies one stand-alone repair to a SUMMARY (never to the document): add the context sentence,
 * swap the flagged sentence for the next best one, or show it without its leading connective.
 * Pure; returns a new summary with figures, shares and warnings brought up to date.
 */
import { countWords } from '../text/tokens';
import type { PickedSentence, Repair, Summary } from '../types';
import { sectionPath, unitOfSection } from './sections';

/** A source sentence brought in by a repair: unranked (rank 0), no score of its own. */
function pickFromSource(summary: Summary, index: number, reason: string): PickedSentence | null {
  const sentence = summary.document.sentences[index];
  if (!sentence) return null;
  return {
    sentence: index,
    text: sentence.text,
    span: sentence.span,
    sectionPath: sectionPath(summary.document, sentence.section),
    section: sentence.section,
    score: 0,
    rank: 0,
    features: { [reason]: 1 },
  };
}

export type RepairOutcome = { readonly ok: true; readonly summary: Summary; readonly description: string } | { readonly ok: false; readonly reason: string };

export function applyRepair(summary: Summary, warningIndex: number, repairIndex: number): RepairOutcome {
  const warning = summary.warnings[warningIndex];
  const repair: Repair | undefined = warning?.repairs[repairIndex];
  if (!warning || !repair) return { ok: false, reason: 'That repair is no longer offered.' };
  if (!summary.sentences.some((pick) => pick.sentence === warning.sentence)) return { ok: false, reason: 'The flagged sentence is no longer in the summary.' };

  let picks = [...summary.sentences];
  const removed: PickedSentence[] = [];
  const added: PickedSentence[] = [];
  let description: string;

  switch (repair.kind) {
    case 'addContext': {
      for (const index of repair.sentences) {
        if (picks.some((pick) => pick.sentence === index)) continue;
        const pick = pickFromSource(summary, index, 'addedAsContext');
        if (pick) added.push(pick);
      }
      description = added.length === 1 ? 'Added the context sentence.' : `Added ${added.length} context sentences.`;
      break;
    }
    case 'replace': {
      removed.push(...picks.filter((pick) => pick.sentence === warning.sentence));
      const replacement = repair.replacement;
      if (replacement !== null && !picks.some((pick) => pick.sentence === replacement)) {
        const pick = pickFromSource(summary, replacement, 'replacedDanglingSentence');
        if (pick) added.push(pick);
      }
      description = added.length > 0 ? 'Swapped the sentence for the next best one.' : 'Dropped the sentence from the summary.';
      break;
    }
    case 'trimConnective': {
      picks = picks.map((pick) =>
        pick.sentence === warning.sentence ? { ...pick, text: repair.text, edited: { reason: `leading “${warning.words}” removed` } } : pick,
      );
      description = `Showing the sentence without “${warning.words}”.`;
      break;
    }
  }

  const removedIds = new Set(removed.map((pick) => pick.sentence));
  picks = picks.filter((pick) => !removedIds.has(pick.sentence)).concat(added);
  picks.sort((a, b) => a.span.start - b.span.start);

  // Figures the repair changed; word counts of untouched sentences stay the engine's.
  const before = summary.sentences.find((pick) => pick.sentence === warning.sentence);
  const after = picks.find((pick) => pick.sentence === warning.sentence);
  const trimmedDelta = before && after ? countWords(after.text) - countWords(before.text) : 0;
  const wordsOut = Math.max(
    0,
    summary.stats.wordsOut + trimmedDelta + added.reduce((n, p) => n + countWords(p.text), 0) - removed.reduce((n, p) => n + countWords(p.text), 0),
  );

  const unitWords = new Map<number, { words: number; picked: number }>();
  for (const pick of picks) {
    const unit = unitOfSection(summary, pick.section);
    const entry = unitWords.get(unit) ?? { words: 0, picked: 0 };
    entry.words += countWords(pick.text);
    entry.picked += 1;
    unitWords.set(unit, entry);
  }
  const totalWords = [...unitWords.values()].reduce((n, e) => n + e.words, 0);
  const shares = summary.shares.map((share) => {
    const entry = unitWords.get(share.section);
    return { ...share, picked: entry?.picked ?? 0, summaryShare: entry && totalWords > 0 ? entry.words / totalWords : 0 };
  });

  const warnings = summary.warnings.filter((w, index) => index !== warningIndex && !removedIds.has(w.sentence));

  return {
    ok: true,
    description,
    summary: {
      ...summary,
      sentences: picks,
      shares,
      warnings,
      stats: {
        ...summary.stats,
        wordsOut,
        sentencesOut: picks.length,
        compression: summary.stats.wordsIn > 0 ? wordsOut / summary.stats.wordsIn : 0,
        sectionsCovered: shares.filter((share) => share.picked > 0).length,
      },
    },
  };
}
