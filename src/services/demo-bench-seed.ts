// The demo shop's bench: tickets with garments at every step and fitting measurements per leg.
// Every garment, length and note here is invented for the demo.
import { db } from '@/db';
import { auditMany } from './audit';
import { refreshTicketAssignee } from './garments';
import { auditEvents, garments, measurements, tickets } from '@/db/schema';
import { parseLength } from '@/lib/allowance';
import type { ExistingFinish } from '@/lib/shared/existing-finish';
import { leastAdvanced, type GarmentStep } from '@/lib/shared/garment-steps';
import type { Finish, LegLength, SavedLength } from '@/lib/shared/measurement-request';
import type { Role } from '@/lib/shared/roles';

type Lengths = Partial<Record<LegLength, string>>;
interface DemoGarment {
  description: string;
  status: GarmentStep;
  who?: Role;
  dueIn: number;
  fitting?: { finish: Finish; left: Lengths; right?: Lengths };
  /** how the pair came in; plain hem when not said */
  existingFinish?: ExistingFinish;
  /** a ready pair: days since it became ready (the queue shows "Ready 3 days") */
  readyDaysAgo?: number;
}
interface DemoTicket {
  customer: number;
  note: string;
  garments: DemoGarment[];
}

const TICKETS: DemoTicket[] = [
  { customer: 0, note: 'Grey flannel: shorten, add cuffs.', garments: [{ description: 'Grey flannel trousers', status: 'received', dueIn: 3 }] },
  {
    customer: 1,
    note: 'Two pairs of chinos: plain hem.',
    garments: [
      {
        description: 'Stone chinos',
        status: 'marked',
        dueIn: 0,
        fitting: { finish: 'plain', left: { backPin: '30 1/2', available: '2 3/4', hemAllowance: '1 1/2' } },
      },
      { description: 'Olive chinos', status: 'received', dueIn: 0 },
    ],
  },
  {
    customer: 2,
    note: 'Navy suit trousers: cuff 1½ in.',
    garments: [
      {
        description: 'Navy suit trousers',
        status: 'cut',
        who: 'apprentice',
        dueIn: -1,
        fitting: {
          finish: 'cuff',
          left: { backPin: '31 1/4', cuffDepth: '1 1/2', available: '5' },
          right: { backPin: '31 1/2', cuffDepth: '1 1/2', available: '4 3/4' },
        },
      },
    ],
  },
  {
    customer: 3,
    note: 'Came in with cuffs: let down and cuff again; check the cloth.',
    garments: [
      {
        description: 'Charcoal wool trousers',
        existingFinish: 'cuff',
        status: 'stitched',
        who: 'tailor',
        dueIn: 1,
        fitting: {
          finish: 'cuff',
          left: {
            backPin: '33',
            frontPin: '32 3/4',
            cuffDepth: '1 3/4',
            available: '5 1/4',
            widthAtEdge: '8',
            widthAbove: '8 3/4',
            heightAbove: '6',
            seamAllowance: '1/2',
          },
        },
      },
    ],
  },
  { customer: 0, note: 'Corduroy: shortened, plain hem.', garments: [{ description: 'Brown corduroy trousers', status: 'ready', dueIn: -2, readyDaysAgo: 3 }] },
  { customer: 1, note: 'Linen trousers: taken up ¾ in.', garments: [{ description: 'Linen trousers', status: 'collected', dueIn: -5 }] },
];

/** A date this many days from today, in local time (as the queue reads due dates). */
function day(offset: number): string {
  const d = new Date();
  d.setDate(d.getDate() + offset);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

// A ticket whose work became ready days ago came in a week before that; the others today.
function takenIn(t: DemoTicket): Date {
  const ready = Math.max(0, ...t.garments.map((g) => g.readyDaysAgo ?? 0));
  return new Date(Date.now() - (ready ? ready + 7 : 0) * 86_400_000);
}

function read(lengths: Lengths): Partial<Record<LegLength, SavedLength>> {
  return Object.fromEntries(Object.entries(lengths).map(([f, text]) => [f, { text, mm: parseLength(text, 'in').mm }]));
}

/** Adds the demo tickets, garments and fittings to the demo shop. */
export async function seedBenchDemo(shopId: string, customerIds: string[], people: Partial<Record<Role, string>>): Promise<void> {
  let number = 1000;
  for (const t of TICKETS) {
    number += 1;
    const [ticket] = await db
      .insert(tickets)
      .values({
        shopId,
        number,
        customerId: customerIds[t.customer],
        note: t.note,
        status: leastAdvanced(t.garments.map((g) => g.status)),
        createdById: people.counter,
        createdAt: takenIn(t),
      })
      .returning();
    for (const [position, g] of t.garments.entries()) {
      const [row] = await db
        .insert(garments)
        .values({
          shopId,
          ticketId: ticket!.id,
          position,
          description: g.description,
          status: g.status,
          dueOn: day(g.dueIn),
          assigneeId: g.who ? people[g.who] : null,
          existingFinish: g.existingFinish,
          createdAt: ticket!.createdAt,
        })
        .returning();
      if (g.readyDaysAgo !== undefined) {
        // Its move to ready, back then, as the bench would have recorded it.
        const at = new Date(Date.now() - g.readyDaysAgo * 86_400_000);
        await db
          .insert(auditEvents)
          .values({ shopId, actorId: people.tailor ?? null, action: 'garment.moved', subject: row!.id, detail: { from: 'pressed', to: 'ready' }, at });
      }
      if (!g.fitting) continue;
      const legs = { left: g.fitting.left, right: g.fitting.right ?? g.fitting.left };
      for (const leg of ['left', 'right'] as const) {
        await db
          .insert(measurements)
          .values({ shopId, garmentId: row!.id, leg, unit: 'in', finish: g.fitting.finish, values: read(legs[leg]), takenById: people.tailor });
        // The fitting's history, as if typed in at the fitting.
        const typed = [['finish', g.fitting.finish], ...Object.entries(legs[leg])];
        await auditMany(
          db,
          typed.map(([field, value]) => ({
            shopId,
            actorId: people.tailor ?? null,
            action: 'measurement.changed',
            subject: row!.id,
            detail: { leg, field, old: null, new: value, unit: 'in' },
          })),
        );
      }
    }
    await refreshTicketAssignee(db, shopId, ticket!.id);
  }
}
