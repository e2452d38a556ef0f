// The shop's bench settings: the measuring scale and its own names for the steps.
import { route } from '@/lib/server/route';
import { settingsRequest } from '@/lib/shared/bench-requests';
import { benchSettings, saveBenchSettings } from '@/services/shop-settings';
import { benchSettingsJson } from '@/lib/server/answers/bench';

/** The shop's scale and step names (everyone at the bench reads them). */
export const GET = route(
  { summary: "The shop's measuring scale and its names for the steps.", permission: ['tickets', 'read'], responses: { 200: benchSettingsJson } },
  ({ actor }) => benchSettings(actor.shopId),
);

/** Saves the shop's scale and step names (the lead). */
export const PUT = route(
  {
    summary: "Saves the shop's measuring scale and step names.",
    permission: ['settings', 'update'],
    body: settingsRequest,
    examples: [{ summary: 'Eighths of an inch, the usual step names', body: { scale: 'in8', stepLabels: {} } }],
    responses: { 200: benchSettingsJson },
  },
  ({ actor, body }) => saveBenchSettings(actor, body),
);
