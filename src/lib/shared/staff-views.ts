// What the staff routes answer, shared by the service and the lead's staff screen (dates as
// strings, as the screen receives them), so the screen imports nothing from services.
import type { Role } from './roles';

/** One person on the staff list. */
export interface StaffMember {
  id: string;
  userId: string;
  name: string;
  email: string;
  role: Role;
  since: string;
}

/** A pending invitation on the staff list. */
export interface PendingInvite {
  id: string;
  email: string;
  role: Role;
  expiresAt: string;
}
