// Accepting an invitation: a new account (name + password), or one click when already signed in.
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import { acceptInviteInput } from '@/lib/shared/account-inputs';
import { fetchJson } from '@/lib/shared/fetch-json';
import { withQuery } from '@/components/WithQuery';
import { Field, FormMessage, SubmitButton } from '@/components/Field';

type Input = z.infer<typeof acceptInviteInput>;

function AcceptInviteForm({ id, email, signedIn }: { id: string; email: string; signedIn: boolean }) {
  const { register, handleSubmit, formState } = useForm<Input>({ resolver: zodResolver(acceptInviteInput) });
  const accept = useMutation({
    mutationFn: (input?: Input) => fetchJson(`/api/invitations/${encodeURIComponent(id)}/accept`, { body: input ?? {} }),
    onSuccess: () => window.location.assign('/bench'),
  });
  if (signedIn) {
    return (
      <div className="flex flex-col gap-4">
        {accept.error && <FormMessage kind="error">{accept.error.message}</FormMessage>}
        <button type="button" onClick={() => accept.mutate(undefined)} className="min-h-11 rounded bg-accent px-5 py-2 text-lg font-semibold text-white">
          Join the shop
        </button>
      </div>
    );
  }
  return (
    <form onSubmit={handleSubmit((v) => accept.mutate(v))} className="flex flex-col gap-4" noValidate>
      <p>
        Your sign-in will be <strong>{email}</strong>.
      </p>
      <Field label="Your name" autoComplete="name" registration={register('name')} error={formState.errors.name} />
      <Field
        label="Choose a password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        registration={register('password')}
        error={formState.errors.password}
      />
      {accept.error && <FormMessage kind="error">{accept.error.message}</FormMessage>}
      <SubmitButton busy={accept.isPending || accept.isSuccess}>Join the shop</SubmitButton>
    </form>
  );
}

/** The invitation-acceptance island. */
export default withQuery(AcceptInviteForm);
