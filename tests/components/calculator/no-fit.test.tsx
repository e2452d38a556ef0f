// Short of cloth, the calculator's headline says it does not fit and lists what still fits, the
// customer's own cuff depth on a shorter third section first (issue 11), then a shallower cuff.
// A cuff takes three sections below the mark (docs/TRADE.md): 1 1/2 in needs 4 1/2 in, its
// inner fold is 3 in below the mark; with 4 1/4 in of cloth the third section can be 1 1/4 in
// (4 1/4 − 3), which still holds the 1/2 in turn-under and the engine's 1/4 in safe stitch
// (common practice, no source).
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { planCuff } from '@/lib/allowance';
import { NoFit } from '@/components/calculator/ClothCheck';

const text = (html: string) => html.replace(/<[^>]+>/g, '').replace(/\s+/g, ' ');

describe('NoFit', () => {
  it('offers the asked cuff with a shorter third section, before a shallower cuff, right under the headline', () => {
    const plan = planCuff({ unit: 'in', precision: 8, cuffDepth: '1 1/2', available: '4 1/4' });
    expect(plan.alternatives?.shorterSection?.text).toBe('1 1/4 in');
    const shown = text(renderToStaticMarkup(<NoFit plan={plan} />));
    const at = (s: string) => shown.indexOf(s);
    expect(shown).toContain('Does not fit: do not cut. Short by 1/4 in.');
    expect(shown).toContain('The 1 1/2 in cuff as asked, with a shorter third section of 1 1/4 in');
    // Headline, then what fits (shorter section first), then the figures.
    expect(at('Does not fit')).toBeLessThan(at('What still fits:'));
    expect(at('shorter third section')).toBeLessThan(at('A shallower cuff of'));
    expect(at('A faced cuff')).toBeLessThan(at('This cuff needs 4 1/2 in below the mark'));
  });

  it('leaves the shorter section out when even the turn-under and a safe stitch do not fit', () => {
    // 3 1/8 in of cloth leaves 1/8 in below the inner fold: less than 1/2 + 1/4 in.
    const plan = planCuff({ unit: 'in', precision: 8, cuffDepth: '1 1/2', available: '3 1/8' });
    expect(plan.alternatives?.shorterSection).toBeNull();
    expect(text(renderToStaticMarkup(<NoFit plan={plan} />))).not.toContain('shorter third section');
  });
});
