// Sign-up: creates a shop and its first lead, and signs the lead in.
import { json } from '@/lib/server/api';
import { shopSignUpInput } from '@/lib/shared/account-inputs';
import { route } from '@/lib/server/route';
import { createShop } from '@/services/shops';
import { shopCreatedJson } from '@/lib/server/answers/site';

/** Public by design: anyone may open a new shop. */
export const POST = route(
  {
    summary: 'Opens a new shop with its first lead, and signs the lead in (the session cookie comes back).',
    permission: 'public',
    body: shopSignUpInput,
    status: 201,
    examples: [
      { summary: 'A new shop', body: { shopName: 'Example Hems', name: 'Alex Example', email: 'alex@example-hems.test', password: 'a-long-password' } },
    ],
    responses: { 201: shopCreatedJson },
  },
  async ({ body }) => {
    const { shopId, headers } = await createShop(body);
    return json({ shopId }, 201, headers);
  },
);
