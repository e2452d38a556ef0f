// What an invitation link offers (public: the id itself is the secret from the e-mail).
import type { APIRoute } from 'astro';
import { run } from '@/lib/api';
import { viewInvitation } from '@/services/invitations';

/** The pending invitation's shop, role and e-mail. */
export const GET: APIRoute = async ({ params }) => run(() => viewInvitation(params.id ?? ''));
