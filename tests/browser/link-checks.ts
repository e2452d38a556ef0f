// Links in a sentence must not be told apart by colour alone (WCAG 1.4.1). axe-core's
// link-in-text-block checks only links laid out inline; a link drawn as inline-flex (for its 44 px
// height) sits in the sentence just the same, so this looks at every link the way a reader sees it.
import type { Page } from 'playwright-core';

/** Links shown among other words of their block without an underline, border or background. */
export function colourOnlyLinks(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const found: string[] = [];
    const controls = 'a, button, input, select, textarea, label, summary, [role="button"], .sr-only';
    const blockOf = (el: Element): Element => {
      for (let a = el.parentElement; a; a = a.parentElement) {
        const d = getComputedStyle(a).display;
        if (!d.startsWith('inline') && d !== 'contents') return a;
      }
      return document.body;
    };
    for (const link of document.querySelectorAll('a[href]')) {
      if (!link.checkVisibility() || link.closest('.sr-only')) continue;
      const s = getComputedStyle(link);
      // A flex or grid item (the header's name, a card's link) is blockified: its own line, not in a sentence.
      if (!s.display.startsWith('inline')) continue;
      if (s.textDecorationLine.includes('underline')) continue;
      // Drawn as a button or tab: its own frame or fill marks it.
      if (parseFloat(s.borderBottomWidth) > 0 || s.backgroundColor !== 'rgba(0, 0, 0, 0)') continue;
      const block = blockOf(link);
      // The block's own words: text outside links and other controls, as shown.
      const walker = document.createTreeWalker(block, NodeFilter.SHOW_TEXT);
      let words = '';
      for (let t = walker.nextNode(); t; t = walker.nextNode()) {
        const parent = t.parentElement!;
        if (parent.closest(controls) || !parent.checkVisibility()) continue;
        words += t.textContent ?? '';
      }
      if (/[\p{L}\p{N}]/u.test(words)) {
        found.push(
          `link "${(link.textContent ?? '').trim().slice(0, 60)}" (${link.getAttribute('href')}) sits among the words "${words.replace(/\s+/g, ' ').trim().slice(0, 80)}" told apart by colour alone: underline it`,
        );
      }
    }
    return found;
  });
}
