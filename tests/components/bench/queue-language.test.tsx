// The queue and the Mark buttons in the shop's language: the page sends its part of the catalog and
// the island renders from it; English stays as it was written.
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import Queue from '@/components/bench/Queue';
import { StepButton } from '@/components/bench/StepButton';
import { LanguageProvider } from '@/components/I18n';
import { messagesFor, QUEUE_MESSAGES } from '@/lib/server/i18n/catalog';
import type { Language } from '@/lib/shared/i18n/languages';

const queue = (language: Language) =>
  renderToStaticMarkup(
    <Queue language={language} messages={messagesFor(language, QUEUE_MESSAGES)} userId="u1" shopName="Hemline Hall" canAdvance canPickup who={[]} />,
  );

const button = (language: Language | null) => {
  const inner = <StepButton garmentId="g1" status="received" canAdvance canPickup what="HH-1 Grey flannels" size="row" />;
  return renderToStaticMarkup(
    <QueryClientProvider client={new QueryClient()}>{language ? <LanguageProvider language={language}>{inner}</LanguageProvider> : inner}</QueryClientProvider>,
  );
};

describe('the queue in the shop language', () => {
  it('draws its filters and its loading line in French for a French shop', () => {
    const html = queue('fr');
    expect(html).toContain('Filtrer la file');
    expect(html).toContain('Client ou ticket');
    expect(html).toContain('Tout sauf retiré');
    expect(html).toContain('Chargement de la file…');
    expect(html).not.toMatch(/Loading|Filter the queue|queue\.|All not collected/);
  });

  it('keeps its English words for an English shop', () => {
    const html = queue('en');
    expect(html).toContain('Filter the queue');
    expect(html).toContain('All not collected');
    expect(html).toContain('Loading the queue…');
  });

  it('names the Mark button with the step in the page language, and in English where the page gave none', () => {
    expect(button('fr')).toContain('Marquer Tracé à la craie');
    expect(button('fr')).toContain('aria-label="Marquer Tracé à la craie : HH-1 Grey flannels"');
    expect(button('en')).toContain('Mark Chalk-marked');
    expect(button(null)).toContain('aria-label="Mark Chalk-marked: HH-1 Grey flannels"');
  });
});

describe('the queue’s counted words', () => {
  it('says how long ready work has waited in each language', async () => {
    const { translator } = await import('@/lib/server/i18n/catalog');
    const { readyAge } = await import('@/lib/shared/queue-filter');
    // English as readyAge itself writes it, for 0, 1 and 3 days.
    for (const [at, today] of [
      ['2026-12-03T09:00:00', '2026-12-03'],
      ['2026-12-02T09:00:00', '2026-12-03'],
      ['2026-11-30T09:00:00', '2026-12-03'],
    ] as const) {
      const age = readyAge(at, today)!;
      expect(translator('en')('queue.readyAge', { days: age.days })).toBe(age.text);
    }
    expect(translator('fr')('queue.readyAge', { days: 3 })).toBe('Prêt depuis 3 jours');
    expect(translator('fr')('queue.readyAge', { days: 0 })).toBe('Prêt aujourd’hui');
  });
});
