// The four shop roles and what each may do: the one definition read by the server (API guards,
// better-auth's organization plugin via auth-plugins.ts) and by the islands (what to show).
// Plain data on purpose: islands import it without pulling better-auth into the browser.

/** Every resource and the actions on it that a role can be granted. */
export const statements = {
  // better-auth's organization plugin checks these on its own endpoints.
  organization: ['update', 'delete'],
  member: ['create', 'update', 'delete'],
  invitation: ['create', 'cancel'],
  team: ['create', 'update', 'delete'],
  ac: ['create', 'read', 'update', 'delete'],
  staff: ['read', 'invite', 'change-role', 'remove'],
  settings: ['update'],
  // update: the price list; adjust: a ticket's price lines, with a reason; reduce-any: take off more
  // than half a ticket's total (LEAD_REDUCTION_SHARE in lib/pricing/price-lines.ts).
  prices: ['read', 'update', 'adjust', 'reduce-any'],
  // Deposits, balances and online pay links, taken at the counter.
  payments: ['take'],
  presets: ['read', 'create-own', 'manage-house'],
  // Fitting photos of a garment: every member sees them; the bench takes and removes them.
  photos: ['read', 'upload', 'delete'],
  // browse: the customers screen (each customer's tickets, payments, notices); erase: forget a
  // customer's personal details on their request, keeping the money records.
  customers: ['read', 'create', 'update', 'browse', 'erase'],
  // reopen: step a collected garment back to ready (a hand-over recorded by mistake); any other
  // step back one is for whoever may move garments on (advance).
  tickets: ['read', 'read-all', 'create', 'update', 'advance', 'pickup', 'reopen'],
  measurements: ['read', 'update'],
  plans: ['read', 'create'],
  cutsheets: ['print'],
  notices: ['send'],
  // The messages the shop sent (invitations, ready notices), shown where mail goes to the local capture.
  messages: ['read'],
  // The shop's week at a glance (/overview): intake, hand-overs, due work, takings.
  overview: ['read'],
} as const;

/** A resource name. */
export type Resource = keyof typeof statements;
/** A permission request: one resource and one action on it. */
export type Permission = { [R in Resource]: [R, (typeof statements)[R][number]] }[Resource];

/** What each role is granted. */
export const grants = {
  lead: {
    organization: ['update'],
    member: ['create', 'update', 'delete'],
    invitation: ['create', 'cancel'],
    staff: ['read', 'invite', 'change-role', 'remove'],
    settings: ['update'],
    prices: ['read', 'update', 'adjust', 'reduce-any'],
    payments: ['take'],
    presets: ['read', 'create-own', 'manage-house'],
    photos: ['read', 'upload', 'delete'],
    customers: ['read', 'create', 'update', 'browse', 'erase'],
    tickets: ['read', 'read-all', 'create', 'update', 'advance', 'pickup', 'reopen'],
    measurements: ['read', 'update'],
    plans: ['read', 'create'],
    cutsheets: ['print'],
    notices: ['send'],
    messages: ['read'],
    overview: ['read'],
  },
  tailor: {
    prices: ['read'],
    presets: ['read', 'create-own'],
    photos: ['read', 'upload', 'delete'],
    customers: ['read', 'create', 'update'],
    tickets: ['read', 'read-all', 'create', 'update', 'advance'],
    measurements: ['read', 'update'],
    plans: ['read', 'create'],
    cutsheets: ['print'],
  },
  // Sees only the queue: tickets assigned to them or to nobody (see services/tickets.ts).
  apprentice: {
    presets: ['read'],
    photos: ['read'],
    tickets: ['read', 'advance'],
    measurements: ['read'],
    plans: ['read'],
    cutsheets: ['print'],
  },
  counter: {
    prices: ['read', 'adjust'],
    payments: ['take'],
    photos: ['read'],
    customers: ['read', 'create', 'update', 'browse'],
    tickets: ['read', 'read-all', 'create', 'pickup'],
    plans: ['read'],
    notices: ['send'],
  },
} as const satisfies Record<string, { [R in Resource]?: readonly (typeof statements)[R][number][] }>;

/** The role names, lead first. */
export const ROLES = ['lead', 'tailor', 'apprentice', 'counter'] as const;
/** A shop role. */
export type Role = (typeof ROLES)[number];

/** What each role is called on screen and what it is for. */
export const ROLE_LABELS: Record<Role, { name: string; blurb: string }> = {
  lead: { name: 'Lead', blurb: 'Runs the shop: staff, house presets, prices, settings.' },
  tailor: { name: 'Tailor', blurb: 'Customers, tickets, fitting measurements, plans, own presets.' },
  apprentice: { name: 'Apprentice', blurb: 'Works the queue: reads tickets, prints cut sheets, moves jobs along.' },
  counter: { name: 'Counter', blurb: 'Customers, intake, pickup and notices; reads plans.' },
};

/** True when the string names a shop role. */
export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}

/** True when the role is granted the action on the resource. */
export function can(role: Role | null | undefined, [resource, action]: Permission): boolean {
  if (!role) return false;
  const granted = (grants[role] as Partial<Record<Resource, readonly string[]>>)[resource];
  return granted?.includes(action) ?? false;
}
