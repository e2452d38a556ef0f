// A length saved with its own unit ("38 mm" in an inch shop) reads as typed with that unit, plus the
// shop-unit reading, in the history and in the apprentice's table; never "38 mm in".
// 38 mm = 1.496 in: 1 1/2 in to the eighth (1 in = 25.4 mm, NBS 1959).
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { FittingHistory } from '@/components/bench/FittingHistory';
import { FittingReadOnly } from '@/components/bench/FittingReadOnly';
import type { AuditEntry, FittingView } from '@/lib/shared/bench-types';

const text = (html: string) =>
  html
    .replace(/<[^>]+>/g, ' ')
    .replace(/&#x27;/g, "'")
    .replace(/\s+/g, ' ');

function change(field: string, old: string, now: string): AuditEntry {
  return {
    id: field,
    at: '2026-12-01T10:00:00Z',
    actorName: 'Ilse Marrow',
    action: 'measurement.changed',
    detail: { leg: 'left', field, unit: 'in', old, new: now },
  };
}

describe('the fitting history', () => {
  it('shows a cuff depth typed in mm in an inch shop as typed, with the inch reading', () => {
    const html = text(renderToStaticMarkup(<FittingHistory history={[change('cuffDepth', '1 1/2', '38 mm')]} label={(s) => s} unit="in" precision={8} />));
    expect(html).toContain('Left leg, Cuff depth: 1 1/2 in → 38 mm (= 1 1/2 in)');
    expect(html).not.toContain('38 mm in');
  });

  it('keeps a pinned length typed as a sum as typed, with what it reads as', () => {
    const html = text(renderToStaticMarkup(<FittingHistory history={[change('backPin', '', '31 3/4 + 1/8')]} label={(s) => s} unit="in" precision={8} />));
    expect(html).toContain('Pin at the back (finished length): nothing → 31 3/4 + 1/8 in (= 31 7/8 in)');
  });
});

describe('the apprentice’s table of the fitting', () => {
  it('shows each length with its own unit and the shop reading below', () => {
    const fitting: FittingView = {
      history: [],
      legs: [
        {
          leg: 'left',
          unit: 'in',
          finish: 'cuff',
          preset: null,
          presetId: null,
          takenAt: '2026-12-01T10:00:00Z',
          takenBy: null,
          values: { cuffDepth: { text: '38 mm', mm: 38 }, available: { text: '5', mm: 127 } },
        },
      ],
    };
    const html = text(
      renderToStaticMarkup(
        <QueryClientProvider client={new QueryClient()}>
          <FittingReadOnly fitting={fitting} unit="in" precision={8} />
        </QueryClientProvider>,
      ),
    );
    expect(html).toContain('Cuff depth 38 mm = 1 1/2 in');
    expect(html).toContain('Cloth below the mark 5 in —');
    expect(html).not.toContain('38 mm in');
  });
});
