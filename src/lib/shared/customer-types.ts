// The shapes the customers routes answer with, for the islands to type their queries.
import type { ContactPreference } from './contact-channels';
import type { AuditEntry } from './bench-types';
import type { GarmentStep } from './garment-steps';
import type { Finish, Leg } from './measurement-request';

/** A customer found by the search box, with their latest ticket number. */
export interface CustomerHit {
  id: string;
  name: string;
  phone: string | null;
  email: string | null;
  lastTicket: number | null;
  /** the latest ticket as the shop writes it ("PH 1003"), or null */
  lastTicketLabel: string | null;
}

/** A customer's own details as the customers screen edits them. */
export interface CustomerDetails {
  id: string;
  name: string;
  phone: string | null;
  email: string | null;
  notes: string | null;
  /** how notices and pay links reach them */
  contactBy: ContactPreference;
  erasedAt: string | null;
  createdAt: string;
}

/** One ticket of a customer with its garments, payments and notices. */
export interface CustomerTicket {
  id: string;
  number: number;
  /** as the shop writes it ("PH 1003") */
  label: string;
  status: GarmentStep;
  dueOn: string | null;
  createdAt: string;
  garments: { id: string; description: string; status: GarmentStep }[];
  payments: { id: string; method: string; amountMinor: number; currency: string; at: string }[];
  /** money given back or kept as the customer's credit */
  refunds: { id: string; method: string; status: string; amountMinor: number; currency: string; at: string }[];
  notices: { id: string; kind: string; status: string; sentAt: string | null }[];
}

/** Everything the customers screen shows about one customer, history newest first. */
export interface CustomerFile {
  customer: CustomerDetails;
  tickets: CustomerTicket[];
  history: AuditEntry[];
}

/** One leg of an earlier fitting as offered for "same as last time". */
export interface PreviousLeg {
  leg: Leg;
  finish: Finish;
  preset: string | null;
  finishedLength: string | null;
  cuffDepth: string | null;
}

/** An earlier fitting of the customer, offered when a new garment is taken in. */
export interface PreviousFitting {
  garmentId: string;
  kind: string;
  description: string;
  ticketNumber: number;
  /** as the shop writes it ("PH 1003") */
  ticketLabel: string;
  takenAt: string;
  unit: 'in' | 'cm' | 'mm';
  legs: PreviousLeg[];
}
