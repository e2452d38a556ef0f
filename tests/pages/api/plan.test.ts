// POST /api/plan through its exported handler with real Requests: the trade's published figures
// come back as the chalk lines, and bad input of every kind is a 4xx with a message, never a 500.
import type { APIContext } from 'astro';
import fc from 'fast-check';
import { describe, expect, it, vi } from 'vitest';
import { POST } from '@/pages/api/plan';
import type { CuffPlan, HemPlan, TaperPlan } from '@/lib/allowance/types';

async function post(body: unknown, raw = false): Promise<{ status: number; type: string | null; json: any }> {
  const request = new Request('http://localhost/api/plan', {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: raw ? (body as string) : JSON.stringify(body),
  });
  const res = await POST({ request } as unknown as APIContext);
  return { status: res.status, type: res.headers.get('content-type'), json: await res.json() };
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are read as JSON
const line = (plan: { lines: { name: string }[] }, name: string): any => plan.lines.find((l) => l.name === name);

describe('POST /api/plan: published figures', () => {
  it.each([
    {
      source: 'Seam2Seam, "How to Shorten Trousers with Cuff" (2014); Permanent Style, "Suit Style 9" (2020): three times the cuff depth',
      body: { kind: 'cuff', unit: 'in', cuffDepth: '1 1/2' },
      cut: '4 1/2 in',
    },
    {
      source: 'learning-alterations.com, pants hem page: 2 x cuff depth + 1 in hem',
      body: { kind: 'cuff', unit: 'in', cuffDepth: '1 1/4', hemSection: '1' },
      cut: '3 1/2 in',
    },
    {
      source: 'climbingthewillow.com, faux cuffs (2014): 2 x cuff depth + 1/2 in',
      body: { kind: 'cuff', unit: 'in', cuffDepth: '2 1/2', hemSection: '1/2' },
      cut: '5 1/2 in',
    },
    {
      source: 'Seam2Seam (2014), as a number in the JSON rather than text',
      body: { kind: 'cuff', unit: 'in', precision: 8, cuffDepth: 1.5 },
      cut: '4 1/2 in',
    },
    {
      source: 'Permanent Style (2020): modern standard cuff 5 cm, three sections',
      body: { kind: 'cuff', unit: 'cm', cuffDepth: '5' },
      cut: '15 cm',
    },
    {
      source: 'TRADE.md three sections with a 40 mm cuff (common practice depth, no source)',
      body: { kind: 'cuff', unit: 'mm', cuffDepth: '40' },
      cut: '120 mm',
    },
  ])('$source → cut $cut below the mark', async ({ body, cut }) => {
    const { status, type, json } = await post(body);
    expect(status).toBe(200);
    expect(type).toMatch(/^application\/json/);
    expect(json.kind).toBe('cuff');
    expect(line(json, 'cut').belowMark.text).toBe(cut);
    expect(json.lines.map((l: CuffPlan['lines'][number]) => l.name)).toEqual(['finished-edge', 'cuff-top', 'inner-fold', 'cut']);
  });

  it('Seam2Seam (2014): with 4 1/2 in of cloth the folds fall 1 1/2 and 3 in from the cut edge', async () => {
    const { status, json } = await post({ kind: 'cuff', unit: 'in', cuffDepth: '1 1/2', available: '4 1/2' });
    expect(status).toBe(200);
    expect(line(json, 'inner-fold').aboveRawEdge?.text).toBe('1 1/2 in');
    expect(line(json, 'cuff-top').aboveRawEdge?.text).toBe('3 in');
    expect(json.enough).toBe(true);
  });

  it.each([
    { available: '4 1/2', enough: true, spare: '0 in', shortBy: null },
    { available: '5', enough: true, spare: '1/2 in', shortBy: null },
    { available: '4', enough: false, spare: null, shortBy: '1/2 in' },
  ])(
    'Dellafera, Modern Tailoring (1949): leave 4 1/2 to 5 in for a 1 1/2 in turn-up; $available in → enough $enough',
    async ({ available, enough, spare, shortBy }) => {
      const { status, json } = await post({ kind: 'cuff', unit: 'in', cuffDepth: '1 1/2', available });
      expect(status).toBe(200);
      expect(json.enough).toBe(enough);
      expect(json.spare?.text ?? null).toBe(spare);
      expect(json.shortBy?.text ?? null).toBe(shortBy);
      expect(json.alternatives === null).toBe(enough);
    },
  );

  it.each(['1 1/4', '1 1/2', '1 3/4'])("The Encyclopedia of Men's Clothes: %s in is a usual cuff depth, no warning about it", async (cuffDepth) => {
    const { status, json } = await post({ kind: 'cuff', unit: 'in', cuffDepth });
    expect(status).toBe(200);
    expect(json.warnings.map((w: { code: string }) => w.code)).not.toContain('cuff-depth-unusual');
  });

  it("The Encyclopedia of Men's Clothes: cuffs are hemmed level, so a slope on a cuff is warned and left out", async () => {
    const { status, json } = await post({ kind: 'cuff', unit: 'in', cuffDepth: '1 1/2', slope: '1/2' });
    expect(status).toBe(200);
    expect(json.warnings.map((w: { code: string }) => w.code)).toContain('slope-on-cuff');
    expect(line(json, 'cut').belowMark.text).toBe('4 1/2 in');
  });

  it('powersewing.com: plain hem allowance 1 1/4 to 2 in, turn-under 1/4 in; the default sits inside both', async () => {
    const { status, json } = await post({ kind: 'hem', unit: 'in' });
    expect(status).toBe(200);
    expect(json.kind).toBe('hem');
    expect(json.turnUnder.text).toBe('1/4 in');
    expect(json.hemAllowance.mm).toBeGreaterThanOrEqual(1.25 * 25.4);
    expect(json.hemAllowance.mm).toBeLessThanOrEqual(2 * 25.4);
    expect(json.warnings).toEqual([]);
  });

  it('Goodheart-Willcox, Apparel Design (2012) p. 459: a hem 1/2 in lower at the back; the front lines sit 1/2 in higher', async () => {
    const { status, json } = await post({ kind: 'hem', unit: 'in', hemAllowance: '1 1/2', slope: '1/2' });
    expect(status).toBe(200);
    expect(line(json, 'finished-edge').belowMark.text).toBe('0 in');
    expect((line(json, 'finished-edge') as HemPlan['lines'][number]).frontBelowMark.text).toBe('-1/2 in');
    expect(line(json, 'cut').belowMark.text).toBe('1 1/2 in');
    expect((line(json, 'cut') as HemPlan['lines'][number]).frontBelowMark.text).toBe('1 in');
  });

  it('Fit For A Queen, "Hemming Tapered Pants" (2012): 1/4 in short flat is 1/2 in round the leg, 1/4 in at each of the two seams', async () => {
    // 8 in flat at the edge, 10 in flat 12 in up: the cuff top (1 1/2 in up) is 1/4 in wider than the edge.
    const { status, json } = await post({
      kind: 'taper',
      unit: 'in',
      cuffDepth: '1 1/2',
      widthAtEdge: '8',
      widthAbove: '10',
      heightAbove: '12',
      seamAllowance: '1/2',
    });
    expect(status).toBe(200);
    expect(json.kind).toBe('taper');
    expect(json.targetWidth.text).toBe('8 1/4 in');
    const edge = json.lines[0] as TaperPlan['lines'][number];
    expect(edge.change.text).toBe('1/4 in');
    expect(edge.perSeam.text).toBe('1/4 in');
    expect(edge.perSide.text).toBe('1/8 in');
    expect(2 * edge.perSeam.mm).toBeCloseTo(12.7, 9);
  });

  it('a plain hem on a tapered leg (kind hem-taper), and a let-down leg measured at the cut (arithmetic on Fit For A Queen 2012: 7 in flat, 8 in 12 in up)', async () => {
    const base = { kind: 'hem-taper', unit: 'in', widthAtEdge: '7', widthAbove: '8', heightAbove: '12' };
    const followed = await post(base);
    expect(followed.status).toBe(200);
    expect(followed.json).toMatchObject({ kind: 'taper', finish: 'hem', targetWidth: { text: '7 1/8 in' } });
    expect(line(followed.json, 'cut').change.text).toBe('1/4 in');
    const measured = await post({ ...base, widthAtCut: '7 1/2' });
    expect(line(measured.json, 'cut')).toMatchObject({ width: { text: '7 1/2 in' }, change: { text: '-3/8 in' }, measured: true });
    const cuff = await post({
      kind: 'taper',
      unit: 'in',
      cuffDepth: '1 1/2',
      widthAtEdge: '7',
      widthAbove: '8',
      heightAbove: '24',
      widthAtCut: '7 3/8',
      oldCrease: '3',
    });
    expect(line(cuff.json, 'cut').change.text).toBe('-5/16 in');
    const refused = await post({ ...base, widthAtCut: '0' });
    expect(refused.status).toBe(422);
    expect(refused.json.issues).toEqual({ widthAtCut: 'Width at the cutting line must be more than 0.' });
    // Beside the English, the code and values the page renders in its own language.
    expect(refused.json.refusals).toEqual({ widthAtCut: { code: 'not-positive', values: { label: 'Width at the cutting line' } } });
    expect(refused.json.refusal).toEqual({ code: 'not-positive', values: { label: 'Width at the cutting line' } });
  });

  it('US National Bureau of Standards (1959): 1 in = 25.4 mm exactly, whatever unit the plan is shown in', async () => {
    const inch = await post({ kind: 'cuff', unit: 'in', cuffDepth: '1 1/2' });
    const metric = await post({ kind: 'cuff', unit: 'mm', cuffDepth: '1 1/2 in' });
    expect(inch.json.cuffDepth.mm).toBeCloseTo(38.1, 9);
    expect(metric.json.cuffDepth.mm).toBeCloseTo(38.1, 9);
    expect(line(metric.json, 'cut').belowMark.mm).toBeCloseTo(114.3, 9);
    expect(line(metric.json, 'cut').belowMark.text).toMatch(/ mm$/);
  });

  it.each([
    { oldCrease: '1', place: 'behind-cuff', visible: false },
    { oldCrease: '2', place: 'cuff-face', visible: true },
    { oldCrease: '-1', place: 'behind-cuff', visible: false },
    { oldCrease: '-2', place: 'leg-visible', visible: true },
  ])(
    'TRADE.md fold plan (1 1/2 in cuff): line 2 is the cuff top, section 1 and the leg up to the cuff top lie behind the face, section 2 is the face; crease $oldCrease in → $place',
    async ({ oldCrease, place, visible }) => {
      const { status, json } = await post({ kind: 'cuff', unit: 'in', cuffDepth: '1 1/2', oldCrease });
      expect(status).toBe(200);
      expect(json.creaseLands.place).toBe(place);
      expect(json.creaseLands.visible).toBe(visible);
    },
  );

  it("blank optional fields from a form are left to the engine's defaults", async () => {
    const { status, json } = await post({ kind: 'cuff', unit: 'in', cuffDepth: '1 1/2', hemSection: '', turnUnder: '  ', available: '' });
    expect(status).toBe(200);
    expect(json.hemSection.text).toBe('1 1/2 in');
    expect(json.enough).toBeNull();
  });
});

describe('POST /api/plan: bad input is answered, never a 500', () => {
  it.each([
    { why: 'not JSON', raw: '{"kind":"cuff",', status: 400, field: null },
    { why: 'a JSON array', body: [], status: 422, field: null },
    { why: 'JSON null', body: null, status: 422, field: null },
    { why: 'no kind', body: { unit: 'in', cuffDepth: '1' }, status: 422, field: 'kind' },
    { why: 'an unknown kind', body: { kind: 'hemline', unit: 'in' }, status: 422, field: 'kind' },
    { why: 'no unit', body: { kind: 'cuff', cuffDepth: '1' }, status: 422, field: 'unit' },
    { why: 'feet', body: { kind: 'cuff', unit: 'ft', cuffDepth: '1' }, status: 422, field: 'unit' },
    { why: 'a precision of 10', body: { kind: 'cuff', unit: 'in', precision: 10, cuffDepth: '1' }, status: 422, field: 'precision' },
    { why: 'precision as text', body: { kind: 'cuff', unit: 'in', precision: '16', cuffDepth: '1' }, status: 422, field: 'precision' },
    { why: 'no cuff depth', body: { kind: 'cuff', unit: 'in' }, status: 422, field: 'cuffDepth' },
    { why: 'a blank cuff depth', body: { kind: 'cuff', unit: 'in', cuffDepth: '   ' }, status: 422, field: 'cuffDepth' },
    { why: 'a cuff depth of true', body: { kind: 'cuff', unit: 'in', cuffDepth: true }, status: 422, field: 'cuffDepth' },
    { why: 'a cuff depth as an object', body: { kind: 'cuff', unit: 'in', cuffDepth: { mm: 38 } }, status: 422, field: 'cuffDepth' },
    { why: 'a huge number', body: { kind: 'cuff', unit: 'in', cuffDepth: 1e308 }, status: 422, field: 'cuffDepth' },
    { why: 'a novel in a length', body: { kind: 'cuff', unit: 'in', cuffDepth: '1'.repeat(500) }, status: 422, field: 'cuffDepth' },
    { why: 'letters', body: { kind: 'cuff', unit: 'in', cuffDepth: 'abc' }, status: 422, field: 'cuffDepth' },
    { why: 'a fraction over 0', body: { kind: 'cuff', unit: 'in', cuffDepth: '1/0' }, status: 422, field: 'cuffDepth' },
    { why: 'mixed units in one length', body: { kind: 'cuff', unit: 'in', cuffDepth: '1 in + 5 furlongs' }, status: 422, field: 'cuffDepth' },
    { why: 'a cuff depth of 0', body: { kind: 'cuff', unit: 'in', cuffDepth: '0' }, status: 422, field: 'cuffDepth' },
    { why: 'a negative cuff depth', body: { kind: 'cuff', unit: 'in', cuffDepth: -1.5 }, status: 422, field: 'cuffDepth' },
    { why: 'a cuff deeper than any trouser', body: { kind: 'cuff', unit: 'in', cuffDepth: '7' }, status: 422, field: 'cuffDepth' },
    { why: 'a negative third section', body: { kind: 'cuff', unit: 'in', cuffDepth: '1 1/2', hemSection: '-2' }, status: 422, field: 'hemSection' },
    { why: 'cloth given as words', body: { kind: 'cuff', unit: 'in', cuffDepth: '1 1/2', available: 'plenty' }, status: 422, field: 'available' },
    { why: 'a hem allowance as a list', body: { kind: 'hem', unit: 'mm', hemAllowance: [40] }, status: 422, field: 'hemAllowance' },
    { why: 'a slope that is not a length', body: { kind: 'hem', unit: 'in', slope: 'half' }, status: 422, field: 'slope' },
    { why: 'a taper without widths', body: { kind: 'taper', unit: 'in', cuffDepth: '1 1/2' }, status: 422, field: 'widthAtEdge' },
    {
      why: 'a taper that runs out of leg',
      body: { kind: 'taper', unit: 'in', cuffDepth: '1 1/2', widthAtEdge: 1, widthAbove: 10, heightAbove: 1 },
      status: 422,
      field: 'widthAbove',
    },
  ])('$why → $status with a message for $field', async ({ body, raw, status, field }) => {
    const res = raw ? await post(raw, true) : await post(body);
    expect(res.status).toBe(status);
    expect(res.type).toMatch(/^application\/json/);
    expect(typeof res.json.error).toBe('string');
    expect(res.json.error.length).toBeGreaterThan(5);
    if (field) {
      expect(typeof res.json.issues[field]).toBe('string');
      expect(res.json.issues[field].length).toBeGreaterThan(5);
    } else if (status === 400) {
      // Not JSON at all: a message, no field to mark.
      expect(res.json.issues).toBeUndefined();
    } else {
      // Not a plan (an array, null): the message names the body itself, no field of the form.
      expect(Object.keys(res.json.issues)).toEqual(['_']);
    }
  });

  it('marks every field at fault at once, not only the first', async () => {
    const { status, json } = await post({ kind: 'cuff', unit: 'in', cuffDepth: 'abc', available: 'lots', turnUnder: '1/0' });
    expect(status).toBe(422);
    expect(Object.keys(json.issues).sort()).toEqual(['available', 'cuffDepth', 'turnUnder']);
  });

  it('whatever JSON is posted, the answer is 200, 400 or 422, with a message when it is not 200', async () => {
    const length = fc.oneof(
      fc.string({ maxLength: 12 }),
      fc.double({ noNaN: true }),
      fc.integer({ min: -300, max: 300 }),
      fc.constantFrom('1 1/2', '1½', '38 mm', '31 3/4 + 1/8', '-1/2', '0', '1/0', '2e9', '1..5', '3 in in', ' 1 /2', '+', '1/3 cm'),
      fc.anything(),
    );
    const body = fc.oneof(
      fc.record(
        {
          kind: fc.constantFrom('cuff', 'hem', 'taper', 'hem-taper', 'other'),
          unit: fc.constantFrom('in', 'cm', 'mm', 'ft'),
          precision: fc.constantFrom(8, 16, 32, 0, '8'),
          cuffDepth: length,
          hemSection: length,
          turnUnder: length,
          available: length,
          oldCrease: length,
          clothThickness: length,
          slope: length,
          hemAllowance: length,
          widthAtEdge: length,
          widthAbove: length,
          heightAbove: length,
          seamAllowance: length,
          tolerance: length,
          widthAtCut: length,
        },
        { requiredKeys: ['kind', 'unit'] },
      ),
      fc.anything(),
    );
    await fc.assert(
      fc.asyncProperty(body, async (b) => {
        const { status, json } = await post(b);
        expect([200, 400, 422]).toContain(status);
        if (status !== 200) expect(json.error).toEqual(expect.any(String));
      }),
      { numRuns: 400 },
    );
  });

  it('a fault inside the engine is a 500 with a plain message; the details go to the log, not the client', async () => {
    vi.resetModules();
    vi.doMock('@/lib/allowance', async (original) => ({
      ...(await original<typeof import('@/lib/allowance')>()),
      planCuff: () => {
        throw new TypeError('cannot read x of undefined at /srv/cuffwright/secret.ts');
      },
    }));
    const log = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    try {
      const { POST: faulty } = await import('@/pages/api/plan');
      const request = new Request('http://localhost/api/plan', { method: 'POST', body: JSON.stringify({ kind: 'cuff', unit: 'in', cuffDepth: '1' }) });
      const res = await faulty({ request } as unknown as APIContext);
      const json = await res.json();
      expect(res.status).toBe(500);
      expect(json.error).toMatch(/on our side/);
      expect(JSON.stringify(json)).not.toMatch(/secret|srv|TypeError/);
      expect(log).toHaveBeenCalled();
    } finally {
      log.mockRestore();
      vi.doUnmock('@/lib/allowance');
      vi.resetModules();
    }
  });
});
