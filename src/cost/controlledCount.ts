/**
 * controlledCount: the structured counts of one singly-controlled application of a block (as the Hadamard test calls the
 * resolvent and the ladder encodings), with the default override rules for the given options, memoised per block and rule
 * options. The cheaper-B' choice counts every candidate resolvent and the Green's-function cost counts the chosen one again:
 * the second count is the first. Rules look at one block at a time, so the overrides found from this block alone are the
 * ones found from any set of roots that contains it.
 */
import type { Block } from '../circuit/types.js';
import { collectOverrides, defaultOverrideRules, overrideRulesKey, type OverrideRuleOptions } from './collectOverrides.js';
import type { HierarchyCount } from './HierarchyCount.js';
import { structuredBlockCounts } from './structuredCounts.js';

const countsPerBlock = new WeakMap<Block, Map<string, HierarchyCount>>();

/** Counts are shared between callers: read-only. */
export function controlledCount(block: Block, options: OverrideRuleOptions): HierarchyCount {
  let byRules = countsPerBlock.get(block);
  if (!byRules) countsPerBlock.set(block, (byRules = new Map()));
  const key = overrideRulesKey(options);
  let count = byRules.get(key);
  if (!count) {
    count = structuredBlockCounts(block, collectOverrides([block], defaultOverrideRules(options)), { controls: 1 });
    byRules.set(key, count);
  }
  return count;
}
