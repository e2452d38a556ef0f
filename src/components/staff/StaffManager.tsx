import { DEFAULT_LOCALE } from '@/lib/shared/i18n/languages';
// The lead's staff screen: who works here, pending invitations, invite, change role, remove.
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { inviteInput } from '@/lib/shared/account-inputs';
import { fetchJson } from '@/lib/shared/fetch-json';
import { ROLES, ROLE_LABELS, type Role } from '@/lib/shared/roles';
import type { PendingInvite, StaffMember } from '@/lib/shared/staff-views';
import { withQuery } from '@/components/WithQuery';
import { Field, FormMessage, SubmitButton } from '@/components/Field';

type Staff = { members: StaffMember[]; invitations: PendingInvite[] };
type Invite = z.infer<typeof inviteInput>;

function InviteForm() {
  const client = useQueryClient();
  const { register, handleSubmit, formState, reset, watch } = useForm<Invite>({
    resolver: zodResolver(inviteInput),
    defaultValues: { role: 'tailor' },
  });
  const send = useMutation({
    mutationFn: (input: Invite) => fetchJson<PendingInvite>('/api/staff', { body: input }),
    onSuccess: () => {
      reset({ email: '', role: 'tailor' });
      void client.invalidateQueries({ queryKey: ['staff'] });
    },
  });
  return (
    <form onSubmit={handleSubmit((v) => send.mutate(v))} className="flex flex-col gap-4 rounded border-2 border-rule bg-card p-4" noValidate>
      <h2 className="text-xl font-extrabold">Invite someone</h2>
      <Field label="Their e-mail" type="email" autoComplete="off" registration={register('email')} error={formState.errors.email} />
      <div className="flex flex-col gap-1">
        <label htmlFor="invite-role" className="font-semibold">
          Role
        </label>
        <select
          id="invite-role"
          {...register('role')}
          aria-describedby="invite-role-hint"
          className="w-full rounded border-2 border-rule bg-card px-3 py-2 text-lg"
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r].name}
            </option>
          ))}
        </select>
        <p id="invite-role-hint" className="text-sm text-muted">
          {ROLE_LABELS[watch('role') ?? 'tailor'].blurb}
        </p>
      </div>
      {send.error && <FormMessage kind="error">{send.error.message}</FormMessage>}
      {send.isSuccess && <FormMessage kind="ok">Invitation sent to {send.data.email}.</FormMessage>}
      <SubmitButton busy={send.isPending}>Send the invitation</SubmitButton>
    </form>
  );
}

function MemberRow({ m, isMe }: { m: StaffMember; isMe: boolean }) {
  const client = useQueryClient();
  const refresh = () => void client.invalidateQueries({ queryKey: ['staff'] });
  const setRole = useMutation({
    mutationFn: (role: Role) => fetchJson(`/api/staff/${m.id}`, { method: 'PATCH', body: { role } }),
    onSettled: refresh,
  });
  const remove = useMutation({
    mutationFn: () => fetchJson(`/api/staff/${m.id}`, { method: 'DELETE' }),
    onSettled: refresh,
  });
  const error = setRole.error ?? remove.error;
  return (
    <tr className="border-t border-rule align-top">
      <td className="py-2 pr-4">
        <div className="font-semibold">
          {m.name}
          {isMe && ' (you)'}
        </div>
        {/* On a phone the address breaks at the @ before it breaks inside a word. */}
        <div className="text-muted [overflow-wrap:anywhere]">
          {m.email.split('@')[0]}
          <wbr />@{m.email.split('@').slice(1).join('@')}
        </div>
        {error && (
          <p role="alert" className="font-semibold text-cut">
            {error.message}
          </p>
        )}
      </td>
      {/* The role and Remove share a cell and wrap under each other on a phone, leaving the person room. */}
      <td className="py-2">
        <div className="flex flex-wrap items-start gap-x-4 gap-y-2">
          <label className="sr-only" htmlFor={`role-${m.id}`}>
            Role of {m.name}
          </label>
          <select
            id={`role-${m.id}`}
            value={m.role}
            disabled={setRole.isPending}
            onChange={(e) => setRole.mutate(e.target.value as Role)}
            className="rounded border-2 border-rule bg-card px-2 py-2"
          >
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r].name}
              </option>
            ))}
          </select>
          {!isMe && (
            <button
              type="button"
              aria-label={`Remove: ${m.name}`}
              onClick={() => {
                if (window.confirm(`Remove ${m.name} from the shop?`)) remove.mutate();
              }}
              className="min-h-11 rounded border-2 border-cut px-4 font-semibold text-cut"
            >
              Remove
            </button>
          )}
        </div>
      </td>
    </tr>
  );
}

function StaffManager({ myEmail }: { myEmail: string }) {
  const staff = useQuery({ queryKey: ['staff'], queryFn: () => fetchJson<Staff>('/api/staff') });
  return (
    <div className="grid gap-6 md:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <section aria-labelledby="staff-heading">
        <h2 id="staff-heading" className="mb-2 text-xl font-extrabold">
          Staff
        </h2>
        {staff.isPending && <p>Loading…</p>}
        {staff.error && <FormMessage kind="error">{staff.error.message}</FormMessage>}
        {staff.data && (
          <>
            <table className="w-full text-left">
              <thead>
                <tr>
                  <th className="pb-2">Person</th>
                  <th className="pb-2">Role</th>
                </tr>
              </thead>
              <tbody>
                {staff.data.members.map((m) => (
                  <MemberRow key={m.id} m={m} isMe={m.email === myEmail} />
                ))}
              </tbody>
            </table>
            <h3 className="mt-6 mb-2 text-lg font-extrabold">Pending invitations</h3>
            {staff.data.invitations.length === 0 ? (
              <p className="text-muted">None.</p>
            ) : (
              <ul className="flex flex-col gap-1">
                {staff.data.invitations.map((i) => (
                  <li key={i.id}>
                    {i.email}: {ROLE_LABELS[i.role].name}, until{' '}
                    {new Date(i.expiresAt).toLocaleDateString(DEFAULT_LOCALE, { day: 'numeric', month: 'short', year: 'numeric' })}
                  </li>
                ))}
              </ul>
            )}
          </>
        )}
      </section>
      <InviteForm />
    </div>
  );
}

/** The staff island. */
export default withQuery(StaffManager);
