// Cut sheets of saved garments: one garment's sheet, and the morning's batch for the queue as
// filtered on screen. Reads the garment, its ticket, customer, assignee and fitting, plans each
// leg with the engine and renders with the cut-sheet renderer. Shop-scoped through the garment
// services (another shop's garment, or an apprentice's invisible one, is 404).
import { and, eq, inArray } from 'drizzle-orm';
import { db } from '@/db';
import { customers, garments, tickets, user, type Garment } from '@/db/schema';
import { isAllowanceError } from '@/lib/allowance';
import type { Precision, Unit } from '@/lib/allowance/types';
import type { Actor } from '@/lib/server/api';
import { scaleUnit } from '@/lib/shared/bench-requests';
import { ticketLabel } from '@/lib/shared/ticket-number';
import { buildCutSheet, refusedFields, type LegOrder, type SheetHeader } from '@/lib/server/cut-sheet/build';
import { renderInPool, streamInPool } from '@/lib/server/cut-sheet/render-off-thread';
import type { CutSheetData, PageSize } from '@/lib/shared/cut-sheet-types';
import { letDownFirst } from '@/lib/shared/existing-finish';
import { savedLegOrder } from '@/lib/server/fitting/saved-leg';
import type { LegPlanOptions } from '@/lib/shared/leg-plan';
import type { WaistOrder } from '@/lib/shared/waist-order';
import type { SavedLeg } from '@/lib/shared/measurement-request';
import type { Language } from '@/lib/shared/i18n/languages';
import type { QueueRow } from '@/lib/shared/bench-types';
import { filterQueue, type QueueFilter } from '@/lib/shared/queue-filter';
import { ServiceError } from './errors';
import { garmentVisibleTo, listQueue, visibleGarment } from './garments';
import { legsOf, legsOfGarments } from './measurements';
import { kindFittingsOf } from './kind-fittings';
import { buildKindSheet } from '@/lib/server/cut-sheet/kinds/build-kind';
import { GARMENT_KIND_LABELS, isLegKind, kindOf } from '@/lib/shared/fitting/garment-kinds';
import type { KindFittingView } from '@/lib/shared/kind-fitting-request';
import { benchSettings } from './shop-settings';

/** How a sheet is printed; anything left out comes from the shop's bench settings. */
export interface SheetOptions {
  unit?: Unit;
  precision?: 8 | 16;
  pageSize?: PageSize;
}

/** A rendered PDF, the file name it is offered under, and the thread that drew it. */
export interface SheetFile {
  bytes: Uint8Array<ArrayBuffer>;
  filename: string;
  by: 'worker' | 'main';
}

/** The morning's batch as it streams from the sheet pool, and the garments left out for want of a fitting. */
export interface BatchStream {
  body: ReadableStream<Uint8Array>;
  filename: string;
  by: 'worker' | 'main';
  sheets: number;
  skipped: string[];
}

/** The morning's batch read whole: the PDF and the garments left out. */
export interface BatchFile extends SheetFile {
  sheets: number;
  skipped: string[];
}

/** The message a garment with no usable fitting is refused with. */
export const NO_FITTING = 'This garment has no fitting measurements yet: save the fitting first.';

/** How the shop's sheets print: unit, precision, paper and language. */
interface SheetScale {
  unit: Unit;
  precision: Precision;
  pageSize: PageSize;
  language: Language;
  waistOrder: WaistOrder;
}

async function scaleOf(shopId: string, opts: SheetOptions): Promise<SheetScale> {
  const settings = await benchSettings(shopId);
  const shop = scaleUnit(settings.scale);
  const unit = opts.unit ?? shop.unit;
  // The shop's 1/8 or 1/16 carries over to inches asked for without a precision.
  const precision = opts.precision ?? (shop.unit === 'in' ? shop.precision : 8);
  // A metric shop's paper is A4, an inch shop's Letter, unless the print asks for the other.
  return {
    unit,
    precision,
    pageSize: opts.pageSize ?? (shop.unit === 'in' ? 'LETTER' : 'A4'),
    language: settings.language,
    waistOrder: settings.waistOrder,
  };
}

/** The engine's orders for both legs of a saved fitting, read straight from the saved lengths, or a refusal saying what is missing (a let-down pair's measured width at the cut used). */
export function fittingOrders(saved: SavedLeg[], unit: Unit, precision: Precision, opts: LegPlanOptions & { waistOrder?: WaistOrder } = {}): LegOrder[] {
  if (saved.length === 0) throw new ServiceError(422, NO_FITTING);
  const orders: LegOrder[] = [];
  for (const s of saved) {
    const order = savedLegOrder(s, unit, precision, opts);
    if (!order) throw new ServiceError(422, `The ${s.leg} leg has no cuff depth yet: finish the fitting first.`);
    orders.push(order);
  }
  const refused = refusedFields(orders);
  const first = Object.entries(refused)[0];
  if (first) throw new ServiceError(422, `The fitting has a length the plan cannot use (${first[0]}): ${first[1]}`);
  return orders;
}

/** The names a sheet's header shows beside the garment (a queue row carries them already). */
type HeaderNames = Pick<QueueRow, 'ticketNumber' | 'customerName' | 'assigneeName'>;

function headerOf(actor: Actor, g: Garment, names: HeaderNames, baseUrl: string, pageSize: PageSize, language: Language): SheetHeader {
  const what = g.description ?? GARMENT_KIND_LABELS[kindOf(g.kind)];
  return {
    shop: actor.shopName,
    ticket: ticketLabel(names.ticketNumber, actor.shopName),
    // The customer's name beside the garment matches the sheet to the bag it travels with.
    garment: names.customerName ? `${what} (${names.customerName})` : what,
    due: g.dueOn,
    assignee: names.assigneeName,
    link: `${baseUrl.replace(/\/+$/, '')}/garments/${g.id}`,
    pageSize,
    language,
    // An old cuff is let down before any chalk: the sheet's steps start there.
    existingFinish: g.existingFinish,
  };
}

async function namesOf(g: Garment): Promise<HeaderNames> {
  const [row] = await db
    .select({ ticketNumber: tickets.number, customerName: customers.name, assigneeName: user.name })
    .from(tickets)
    .leftJoin(customers, eq(customers.id, tickets.customerId))
    .leftJoin(user, eq(user.id, g.assigneeId ?? ''))
    .where(eq(tickets.id, g.ticketId));
  return row!;
}

/** A garment's saved fitting: its legs (trousers) or its whole-garment fitting (a skirt). */
interface SavedFitting {
  legs: SavedLeg[];
  whole: KindFittingView | null;
}

function sheetOf(actor: Actor, g: Garment, saved: SavedFitting, names: HeaderNames, baseUrl: string, scale: Awaited<ReturnType<typeof scaleOf>>): CutSheetData {
  const header = headerOf(actor, g, names, baseUrl, scale.pageSize, scale.language);
  // Each kind's sheet builder, by the garment's kind: trousers per leg, another kind from its adapter.
  if (!isLegKind(kindOf(g.kind))) {
    if (!saved.whole) throw new ServiceError(422, NO_FITTING);
    try {
      const data = buildKindSheet(header, saved.whole, scale.unit, scale.precision);
      if (!data) throw new ServiceError(422, 'Cut sheets for this kind of garment are not made yet.');
      return data;
    } catch (e) {
      if (isAllowanceError(e)) throw new ServiceError(422, `The fitting cannot be planned: ${e.message}`);
      throw e;
    }
  }
  const orders = fittingOrders(saved.legs, scale.unit, scale.precision, { letDown: letDownFirst(g.existingFinish), waistOrder: scale.waistOrder });
  try {
    return buildCutSheet(header, orders);
  } catch (e) {
    // A fitting saved before the engine refused it (widths that give no leg, say) is the
    // fitting's fault, not the server's: 422 with the engine's words.
    if (isAllowanceError(e)) throw new ServiceError(422, `The fitting cannot be planned: ${e.message}`);
    throw e;
  }
}

const slug = (text: string) =>
  text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60) || 'garment';

/** One garment's cut sheet as a PDF; 404 when the actor may not see it, 422 without a fitting. */
export async function garmentSheet(actor: Actor, garmentId: string, opts: SheetOptions, baseUrl: string): Promise<SheetFile> {
  const g = await visibleGarment(actor, garmentId);
  const scale = await scaleOf(actor.shopId, opts);
  const names = await namesOf(g);
  const whole = isLegKind(kindOf(g.kind)) ? null : ((await kindFittingsOf(actor.shopId, [g.id])).get(g.id) ?? null);
  const data = sheetOf(actor, g, { legs: whole ? [] : await legsOf(g.id), whole }, names, baseUrl, scale);
  const { bytes, by } = await renderInPool(data);
  return { bytes, by, filename: `${slug(ticketLabel(names.ticketNumber, actor.shopName))}-${slug(g.description ?? 'trousers')}.pdf` };
}

/** The queue as filtered on screen, one sheet per garment (garments without a fitting listed on a last page), streamed as it is drawn. */
export async function queueSheetsStream(actor: Actor, filter: QueueFilter, today: string, opts: SheetOptions, baseUrl: string): Promise<BatchStream> {
  const rows = filterQueue(await listQueue(actor), filter, actor.userId, today);
  if (rows.length === 0) throw new ServiceError(422, 'No garments in the queue with these filters.');
  const scale = await scaleOf(actor.shopId, opts);
  const ids = rows.map((r) => r.id);
  // listQueue only lists what the actor may see; the full rows are read once, scoped again.
  const full = new Map(
    (
      await db
        .select()
        .from(garments)
        .where(and(inArray(garments.id, ids), garmentVisibleTo(actor)))
    ).map((g) => [g.id, g]),
  );
  const fittings = await legsOfGarments(ids);
  // A batch may mix kinds: the whole-garment fittings are read in one query beside the legs.
  const wholes = await kindFittingsOf(actor.shopId, ids);
  const sheets: CutSheetData[] = [];
  const skipped: string[] = [];
  for (const row of rows) {
    const g = full.get(row.id);
    if (!g) continue;
    try {
      sheets.push(sheetOf(actor, g, { legs: fittings.get(g.id) ?? [], whole: wholes.get(g.id) ?? null }, row, baseUrl, scale));
    } catch (e) {
      if (!(e instanceof ServiceError)) throw e;
      skipped.push(
        `${ticketLabel(row.ticketNumber, actor.shopName)} ${row.description}: ${e.message === NO_FITTING ? 'no fitting measurements yet' : e.message}`,
      );
    }
  }
  if (sheets.length === 0) {
    const why = skipped.every((line) => line.endsWith(': no fitting measurements yet'))
      ? 'has fitting measurements yet'
      : `can be printed: ${skipped.join('; ')}`;
    throw new ServiceError(422, `None of these garments ${why}.`.replace(/\.\.$/, '.'));
  }
  // Drawn in the sheet pool part by part; the database work above is done before the first byte.
  const { body, by } = await streamInPool(sheets, skipped);
  return { body, by, filename: `cut-sheets-${today}.pdf`, sheets: sheets.length, skipped };
}

/** The same batch read whole (what the stream carries). */
export async function queueSheets(actor: Actor, filter: QueueFilter, today: string, opts: SheetOptions, baseUrl: string): Promise<BatchFile> {
  const { body, ...batch } = await queueSheetsStream(actor, filter, today, opts, baseUrl);
  return { ...batch, bytes: new Uint8Array(await new Response(body).arrayBuffer()) };
}

/** The server's own date, YYYY-MM-DD, for a batch asked for without the device's day. */
export function serverToday(now = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}
