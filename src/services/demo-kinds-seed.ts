// The demo shop's work beside trousers: a skirt to hem and a coat's sleeves to shorten, each fitted
// once (kind_fittings) with the history of typing it in. Every name, garment and length is invented.
import { db } from '@/db';
import { auditMany } from './audit';
import { readKindFitting } from './kind-fittings';
import { customers, garments, kindFittings, tickets } from '@/db/schema';
import type { WholeGarmentKind } from '@/lib/shared/fitting/garment-kinds';
import { adapterOf } from '@/lib/shared/fitting/kind-adapters';
import { kindFittingRequest } from '@/lib/shared/kind-fitting-request';
import type { Role } from '@/lib/shared/roles';

interface DemoKindTicket {
  number: number;
  customer: { name: string; phone?: string; email?: string };
  note: string;
  description: string;
  kind: WholeGarmentKind;
  dueIn: number;
  /** as typed at the fitting, in inches */
  fields: Record<string, string>;
}

/** The two tickets, numbered after the bench's six (demo-bench-seed.ts). */
export const DEMO_KIND_TICKETS: DemoKindTicket[] = [
  {
    number: 1007,
    customer: { name: 'Marisol Tregarthen', phone: '555-0163' },
    note: 'Teal half-circle skirt: level the hem, to be worn with low heels.',
    description: 'Teal half-circle skirt',
    kind: 'skirt',
    dueIn: 3,
    // A half circle 104 in round at the hem, a narrow 1/2 in hem, levelled 15 in from the floor
    // with the marker at 16 in (the pins' rise and the cloth below them at five places).
    fields: {
      hemRound: '104',
      flare: 'circle',
      circleFraction: '1/2',
      hemDepth: '1/2',
      turnUnder: '1/4',
      markerHeight: '16',
      hemFromFloor: '15',
      'pin-centre-front': '1 3/4',
      'cloth-centre-front': '1 1/4',
      'pin-left-side': '2',
      'cloth-left-side': '1 1/4',
      'pin-centre-back': '2 1/2',
      'cloth-centre-back': '1 1/4',
      'pin-right-side': '2 1/8',
      'cloth-right-side': '1 1/4',
    },
  },
  {
    number: 1008,
    customer: { name: 'Hollis Brackwater', email: 'hollis.brackwater@example.net' },
    note: 'Camel overcoat: sleeves 1 1/4 in shorter, keep the three buttons.',
    description: 'Camel overcoat',
    kind: 'sleeves',
    dueIn: 4,
    fields: { shortenBy: '1 1/4', hemDepth: '1 1/2', buttonholes: 'decorative', buttons: '3', buttonSpacing: '5/8', ventLength: '4' },
  },
];

/** A date this many days from today, in local time (as the queue reads due dates). */
function day(offset: number): string {
  const d = new Date();
  d.setDate(d.getDate() + offset);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

/** Adds the skirt and the overcoat, each on its own ticket for a new customer, marked and given to nobody yet. */
export async function seedKindsDemo(shopId: string, people: Partial<Record<Role, string>>): Promise<void> {
  for (const t of DEMO_KIND_TICKETS) {
    const adapter = adapterOf(t.kind)!;
    const read = readKindFitting(adapter, kindFittingRequest.parse({ kind: t.kind, unit: 'in', fields: t.fields }));
    if (!read.ok) throw new Error(`The demo ${t.description} would be refused: ${JSON.stringify(read.issues)}`);
    const [c] = await db
      .insert(customers)
      .values({ shopId, ...t.customer })
      .returning();
    const [ticket] = await db
      .insert(tickets)
      .values({ shopId, number: t.number, customerId: c!.id, note: t.note, status: 'marked', createdById: people.counter })
      .returning();
    const [g] = await db
      .insert(garments)
      .values({ shopId, ticketId: ticket!.id, position: 0, description: t.description, kind: t.kind, status: 'marked', dueOn: day(t.dueIn), assigneeId: null })
      .returning();
    await db
      .insert(kindFittings)
      .values({ shopId, garmentId: g!.id, kind: t.kind, unit: 'in', values: read.values, choices: read.choices, takenById: people.tailor });
    // The fitting's history, as if typed in at the fitting, in the form's order.
    await auditMany(
      db,
      adapter.fields
        .filter((f) => t.fields[f.key] !== undefined)
        .map((f) => ({
          shopId,
          actorId: people.tailor ?? null,
          action: 'kind-fitting.changed',
          subject: g!.id,
          detail: { kind: t.kind, field: f.key, old: null, new: t.fields[f.key]!, unit: 'in' },
        })),
    );
  }
}
