// The SMS service's status callback for one text: no session, the signature is the proof. It is
// checked with the SDK's validator over the public address and the posted fields; unsigned or
// wrongly signed answers 403 and changes nothing.
import { json, problem } from '@/lib/server/api';
import { BodyRefused, JSON_BODY_LIMIT, readLimited } from '@/lib/server/body';
import { route } from '@/lib/server/route';
import { signedUrlOf, verifyStatusCallback } from '@/lib/server/sms-service';
import { recordDeliveryReport } from '@/services/notices';
import { smsReceivedJson } from '@/lib/server/answers/site';

export const prerender = false;

/** Records the delivery report (delivered, undelivered, failed) on the notice the address names. */
export const POST = route(
  {
    summary: "The SMS service's delivery report for one text (?notice=id): form fields signed with X-Twilio-Signature; unsigned answers 403.",
    description: "Called by the SMS service, not by clients: no example, since only a report signed with the service's token is accepted.",
    permission: 'public',
    rawBody: { type: 'application/x-www-form-urlencoded' },
    responses: { 200: smsReceivedJson },
  },
  async ({ request, context }) => {
    let raw: string;
    try {
      raw = new TextDecoder().decode(await readLimited(request, JSON_BODY_LIMIT));
    } catch (e) {
      if (e instanceof BodyRefused) return problem(e.status, e.message);
      throw e;
    }
    const params = Object.fromEntries(new URLSearchParams(raw));
    if (!(await verifyStatusCallback(request.headers.get('x-twilio-signature'), signedUrlOf(request.url), params))) {
      return problem(403, 'The status report is not signed by the SMS service.');
    }
    const recorded = await recordDeliveryReport(context.url.searchParams.get('notice') ?? '', {
      messageSid: params.MessageSid ?? '',
      status: params.MessageStatus ?? '',
      errorCode: params.ErrorCode ?? null,
    });
    return json({ received: true, recorded });
  },
);
