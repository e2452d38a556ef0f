// Sign-up: creates a shop and its first lead, and signs the lead in.
import type { APIRoute } from 'astro';
import { json, readBody, refusal } from '@/lib/api';
import { shopSignUpInput } from '@/lib/account-inputs';
import { createShop } from '@/services/shops';

/** Public by design: anyone may open a new shop. */
export const POST: APIRoute = async ({ request }) => {
  const input = await readBody(request, shopSignUpInput);
  if (input instanceof Response) return input;
  try {
    const { shopId, headers } = await createShop(input);
    return json({ shopId }, 201, headers);
  } catch (e) {
    return refusal(e);
  }
};
