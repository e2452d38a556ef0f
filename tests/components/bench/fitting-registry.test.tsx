// The fitting registry is the one list of a leg's fields: every field in it is asked on the bench
// form for each of its finishes, held by the API's shape, shown in the read-only table and the
// history, and reaches the cut sheet (through the engine's order, or as a recorded line). A field
// added to the registry needs nothing else on these screens; this fails when one of them drops it.
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { FittingHistory } from '@/components/bench/FittingHistory';
import { FittingReadOnly } from '@/components/bench/FittingReadOnly';
import { LegFields } from '@/components/bench/LegFields';
import { buildCutSheet } from '@/lib/server/cut-sheet/build';
import { sheetContent } from '@/lib/server/cut-sheet/content';
import { FIELD, FIELD_KEYS, fieldsOf, FINISH_IDS, partOf, type FieldKey, type Finish } from '@/lib/shared/fitting/kinds';
import { savedLegOrder, type StoredLeg } from '@/lib/server/fitting/saved-leg';
import type { AuditEntry, FittingView } from '@/lib/shared/bench-types';
import { blankLeg, legInput, type MeasurementsInput } from '@/lib/shared/measurement-request';
import { LENGTHS_OF, presetSettings } from '@/lib/shared/preset-settings';
import { cuffRequest, hemRequest, hemTaperRequest, taperRequest } from '@/lib/shared/plan-request';
import { engineFields, valueWords } from '@/lib/shared/fitting/kinds';
import { FITTING_VALUES } from './fitting-values';
import { ORIGINAL_HEM_KEYS } from '@/lib/shared/fitting/plan-lengths';

const text = (html: string) =>
  html
    .replace(/<[^>]+>/g, ' ')
    .replace(/&#x27;/g, "'")
    .replace(/&amp;/g, '&')
    .replace(/\s+/g, ' ');

function Form({ finish }: { finish: Finish }) {
  const { register } = useForm<MeasurementsInput>({ defaultValues: { unit: 'in', legs: { left: blankLeg(finish), right: blankLeg(finish) } } });
  return <LegFields leg="left" finish={finish} unit="in" register={register} onFinish={() => {}} errorFor={() => undefined} readingFor={() => null} letDown />;
}

function stored(finish: Finish): StoredLeg {
  const values: StoredLeg['values'] = {};
  for (const f of fieldsOf(finish, true)) values[f.key as FieldKey] = { text: FITTING_VALUES[f.key as FieldKey] };
  return { leg: 'left', unit: 'in', finish, values };
}

// How a field printed in its note shows its value: a choice by its option's words, a percent with its sign, a length with its unit.
function noteWords(key: FieldKey, value: string): string {
  const f = FIELD[key];
  if (f.unit === 'choice') return valueWords(key, value);
  return f.unit === 'percent' ? `${value}%` : `${value} in`;
}

describe('the fitting registry', () => {
  it('has a sample value for every field (add one beside a new field)', () => {
    expect(Object.keys(FITTING_VALUES).sort()).toEqual([...FIELD_KEYS].sort());
  });

  it('puts every field on the bench form of each of its finishes, and no other', () => {
    for (const finish of FINISH_IDS) {
      const html = renderToStaticMarkup(<Form finish={finish} />);
      for (const key of FIELD_KEYS) {
        const asked = FIELD[key].finishes.includes(finish);
        expect(html.includes(`id="m-legs-left-${key}"`), `${key} on the ${finish} form`).toBe(asked);
        if (asked) expect(text(html)).toContain(FIELD[key].label);
        // A choice offers each of its options by its words (a labelled select).
        if (asked) for (const o of FIELD[key].options ?? []) expect(html, `${key} offers ${o.value}`).toContain(`value="${o.value}"`);
      }
    }
  });

  it('holds every field in the API’s shape of a leg, and every preset field in a preset', () => {
    for (const key of FIELD_KEYS) expect(legInput.shape, key).toHaveProperty(key);
    for (const key of FIELD_KEYS.filter((k) => FIELD[k].preset)) {
      expect(presetSettings.shape, key).toHaveProperty(key);
      for (const finish of FIELD[key].finishes) expect(LENGTHS_OF[partOf(finish)], key).toContain(key);
    }
  });

  it('feeds the engine only lengths its plan requests take (POST /api/plan and the engine read the same keys)', () => {
    const schemas = { cuff: cuffRequest, hem: hemRequest, taper: taperRequest, hemTaper: hemTaperRequest };
    for (const [plan, schema] of Object.entries(schemas)) {
      const fields = engineFields(plan as keyof typeof schemas);
      expect(fields.length, plan).toBeGreaterThan(0);
      for (const { key } of fields) expect(schema.shape, `${key} in ${plan}`).toHaveProperty(key);
    }
  });

  it('shows every field in the read-only table and in the history', () => {
    const values = Object.fromEntries(FIELD_KEYS.map((k) => [k, { text: FITTING_VALUES[k], mm: 1 }]));
    const fitting: FittingView = {
      history: [],
      legs: [{ leg: 'left', unit: 'in', finish: 'cuff', preset: null, presetId: null, takenAt: '2026-12-01T10:00:00Z', takenBy: null, values }],
    };
    const table = text(
      renderToStaticMarkup(
        <QueryClientProvider client={new QueryClient()}>
          <FittingReadOnly fitting={fitting} unit="in" precision={8} />
        </QueryClientProvider>,
      ),
    );
    const history: AuditEntry[] = FIELD_KEYS.map((k) => ({
      id: k,
      at: '2026-12-01T10:00:00Z',
      actorName: 'Ilse Marrow',
      action: 'measurement.changed',
      detail: { leg: 'left', field: k, unit: 'in', old: '', new: FITTING_VALUES[k] },
    }));
    const told = text(renderToStaticMarkup(<FittingHistory history={history} label={(s) => s} unit="in" precision={8} />));
    for (const key of FIELD_KEYS) {
      expect(table, key).toContain(FIELD[key].label);
      expect(told, key).toContain(`Left leg, ${FIELD[key].label}: nothing →`);
    }
  });

  it('brings every printed field of each finish to the cut sheet: into the engine’s order, or as a recorded line', () => {
    for (const finish of FINISH_IDS) {
      const order = savedLegOrder(stored(finish), 'in', 8, { letDown: true })!;
      const content = sheetContent(buildCutSheet({ shop: 'Thimble Row', ticket: '7', garment: null, due: null, assignee: null }, [order]));
      const group = content.groups[0]!;
      for (const f of fieldsOf(finish, true)) {
        const key = f.key as FieldKey;
        const value = FITTING_VALUES[key];
        if (f.printed === 'listed') expect(group.recorded, `${key} (${finish})`).toContain(`${f.label} ${value}`);
        // A field with its own worked note (the shrink lines): there in words, as the note prints its kind.
        if (f.printed === 'note') expect(group.shrink?.join(' '), `${key} (${finish})`).toContain(noteWords(key, value));
        if (f.printed !== 'plan') continue;
        // Unwashed cloth: the typed hem allowance is read by the shrink lines, and the plan takes
        // their unwashed hem allowance (one set of lines on the sheet).
        if (key === 'hemAllowance' && order.finish === 'hem' && order.shrink?.code === 'shrink') {
          expect(order.input.hemAllowance, `${key} (${finish})`).toBe(order.shrink.hem);
          continue;
        }
        const inOrder = [
          // The kept factory hem's join allowance is the engine's seamAllowance (ORIGINAL_HEM_KEYS).
          (order.input as unknown as Record<string, unknown>)[finish === 'original' ? (ORIGINAL_HEM_KEYS[key] ?? key) : key],
          (order.taper as unknown as Record<string, unknown> | undefined)?.[key],
          key === 'backPin' ? order.finished : undefined,
        ];
        expect(inOrder, `${key} (${finish})`).toContain(value);
      }
    }
  });
});

describe('the tack height below the cuff top (the registry’s proof field)', () => {
  it('prints as recorded, with its reading in a metric sheet (3/16 in = 4.7625 mm: 1 in = 25.4 mm, NBS 1959)', () => {
    const leg: StoredLeg = { leg: 'left', unit: 'in', finish: 'cuff', values: { cuffDepth: { text: '1 1/2' }, tackBelowTop: { text: '3/16' } } };
    const inches = sheetContent(buildCutSheet({ shop: null, ticket: null, garment: null, due: null, assignee: null }, [savedLegOrder(leg, 'in', 8)!]));
    expect(inches.groups[0]!.recorded).toBe('Recorded at the fitting: Tack below the cuff top 3/16 in.');
    const mm = sheetContent(buildCutSheet({ shop: null, ticket: null, garment: null, due: null, assignee: null }, [savedLegOrder(leg, 'mm', 8)!]));
    expect(mm.groups[0]!.recorded).toBe('Recorded at the fitting: Tack below the cuff top 3/16 in = 5 mm.');
    // A plain hem has no cuff top: the field is neither asked nor printed.
    const hem = sheetContent(
      buildCutSheet({ shop: null, ticket: null, garment: null, due: null, assignee: null }, [savedLegOrder({ ...leg, finish: 'plain' }, 'in', 8)!]),
    );
    expect(hem.groups[0]!.recorded).toBeNull();
  });
});
