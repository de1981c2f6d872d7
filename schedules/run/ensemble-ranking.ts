/**
 * Strategy ranks under each model of an ensemble, and the sentence that says when a rank changes
 * with the model. A persona's strategies (baseline included) are ranked by the recommendation's
 * ordered comparison (recommend.ts `compareByRule`): fewer work hours at KSS 7 or more, then less
 * misalignment with the person's work and sleep hours, then — to break ties — less melatonin
 * suppression and more daytime light, a difference counting only when it reaches that rule's
 * margin. Rank = 1 + the number of strategies better than this one, so strategies that no margin
 * separates share a rank.
 */
import { compareByRule, ruleFiguresOf } from './recommend.js';
import type { StrategyResult } from './results-types.js';

export const ENSEMBLE_RANKING_RULE =
  "Strategies, the baseline included, ranked under each model by the recommendation's ordered comparison: fewer work hours at KSS 7 or more (by at least 1 percentage point), " +
  'then less misalignment of the body clock with work and sleep hours (by at least 15 min a day), then, to break ties, less melatonin suppression per night (by at least 2 points) ' +
  'and more daytime hours at 250 lx melanopic EDI or more (by at least 15 min); strategies no margin separates share a rank.';

/** What a strategy is ranked on: its summary and its alignment with work and sleep hours. */
export type Ranked = Pick<StrategyResult, 'summary' | 'alignment'>;

/** True when a is better than b by the recommendation's ordered comparison. */
export function rankedBetter(a: Ranked, b: Ranked): boolean {
  return compareByRule(ruleFiguresOf(a), ruleFiguresOf(b)) > 0;
}

/** Rank of each strategy (1 = best), in the order given. */
export function strategyRanks(results: readonly Ranked[]): number[] {
  return results.map((s) => 1 + results.filter((t) => t !== s && rankedBetter(t, s)).length);
}

const ORDINALS = ['first', 'second', 'third', 'fourth', 'fifth', 'sixth', 'seventh', 'eighth', 'ninth', 'tenth'];
export function ordinal(n: number): string {
  return ORDINALS[n - 1] ?? `${n}th`;
}

function names(list: readonly string[]): string {
  if (list.length <= 1) return list.join('');
  return `${list.slice(0, -1).join(', ')} and ${list[list.length - 1] ?? ''}`;
}

/** A model in a ranking sentence; with pairs of models, the body-clock and the sleepiness model it pairs. */
export interface RankedModel {
  readonly name: string;
  readonly rank: number;
  /** Pairs sharing a part and a rank are named by that part once ("the Hannay et al. 2019 model (either KSS model)"). */
  readonly pair?: { readonly clock: string; readonly kss: string };
}

/** Names of the models of one rank: whole groups by sleepiness model, then by body-clock model, then single pairs. */
function groupNames(group: readonly RankedModel[], all: readonly RankedModel[]): string[] {
  const left = new Set(group);
  const out: string[] = [];
  const collapse = (part: 'kss' | 'clock', words: (name: string, n: number) => string) => {
    for (const m of [...left]) {
      const key = m.pair?.[part];
      if (key === undefined || !left.has(m)) continue;
      const members = all.filter((x) => x.pair?.[part] === key);
      if (members.length < 2 || !members.every((x) => left.has(x))) continue;
      out.push(words(key, members.length));
      for (const x of members) left.delete(x);
    }
  };
  collapse('kss', (name, n) => `KSS from the ${name} (${n === 2 ? 'either' : 'any'} body-clock model)`);
  collapse('clock', (name, n) => `the ${name} (${n === 2 ? 'either' : 'any'} KSS model)`);
  for (const m of group) if (left.has(m)) out.push(`the ${m.name}`);
  return out;
}

/**
 * "“Tunable white” ranks first with 2 of 3 body-clock models; with the Hannay et al. 2019
 * single-population model it ranks second." The default model's rank leads; null when every model
 * gives the same rank.
 * @param ranks one per model, the default model first
 * @param noun what the models are called ("body-clock models")
 */
export function rankingSentence(subject: string, ranks: readonly RankedModel[], noun: string): string | null {
  const first = ranks[0];
  if (first === undefined || ranks.every((r) => r.rank === first.rank)) return null;
  const same = ranks.filter((r) => r.rank === first.rank).length;
  const others = [...new Set(ranks.filter((r) => r.rank !== first.rank).map((r) => r.rank))].sort((a, b) => a - b);
  const clauses = others.map((rank) => `with ${names(groupNames(ranks.filter((r) => r.rank === rank), ranks))} it ranks ${ordinal(rank)}`);
  return `${subject} ranks ${ordinal(first.rank)} with ${same} of ${ranks.length} ${noun}; ${clauses.join('; ')}.`;
}
