// Chooses a new password with the token from the e-mailed link.
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import { resetInput } from '@/lib/shared/account-inputs';
import { fetchJson } from '@/lib/shared/fetch-json';
import { withQuery } from '@/components/WithQuery';
import { Field, FormMessage, SubmitButton } from '@/components/Field';

type Input = z.infer<typeof resetInput>;

function ResetForm({ token }: { token: string }) {
  const { register, handleSubmit, formState } = useForm<Input>({ resolver: zodResolver(resetInput) });
  const reset = useMutation({
    mutationFn: (input: Input) => fetchJson('/api/auth/reset-password', { body: { newPassword: input.password, token } }),
  });
  if (reset.isSuccess) {
    return (
      <FormMessage kind="ok">
        Your password is changed.{' '}
        <a href="/sign-in" className="text-accent underline">
          Sign in
        </a>{' '}
        with it.
      </FormMessage>
    );
  }
  return (
    <form onSubmit={handleSubmit((v) => reset.mutate(v))} className="flex flex-col gap-4" noValidate>
      <Field
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        registration={register('password')}
        error={formState.errors.password}
      />
      <Field label="The same again" type="password" autoComplete="new-password" registration={register('confirm')} error={formState.errors.confirm} />
      {reset.error && <FormMessage kind="error">{reset.error.message}</FormMessage>}
      <SubmitButton busy={reset.isPending}>Change the password</SubmitButton>
    </form>
  );
}

/** The reset-password island. */
export default withQuery(ResetForm);
