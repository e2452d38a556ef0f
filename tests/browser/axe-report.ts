// axe-core's results in words a failing test can show: one entry per rule broken, with each
// offending element's selector, its markup and what axe says is wrong with it.
import type { AxeResults } from 'axe-core';

export type { AxeResults } from 'axe-core';

/** The violations as readable paragraphs (none: an empty list). */
export function axeProblems(results: AxeResults): string[] {
  return results.violations.map((v) => {
    const nodes = v.nodes.map((n) => {
      const why = (n.failureSummary ?? '').replace(/\s+/g, ' ').trim();
      return `    at ${n.target.join(' ')}\n      ${n.html.replace(/\s+/g, ' ').slice(0, 200)}\n      ${why}`;
    });
    return `[${v.impact ?? 'no impact'}] ${v.id}: ${v.help} (${v.helpUrl})\n${nodes.join('\n')}`;
  });
}
