// Asks for a password-reset link by e-mail.
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import { forgotInput } from '@/lib/shared/account-inputs';
import { fetchJson } from '@/lib/shared/fetch-json';
import { withQuery } from '@/components/WithQuery';
import { Field, FormMessage, SubmitButton } from '@/components/Field';

type Input = z.infer<typeof forgotInput>;

function ForgotForm() {
  const { register, handleSubmit, formState } = useForm<Input>({ resolver: zodResolver(forgotInput) });
  const ask = useMutation({
    mutationFn: (input: Input) => fetchJson('/api/auth/request-password-reset', { body: { ...input, redirectTo: '/reset' } }),
  });
  if (ask.isSuccess) {
    return <FormMessage kind="ok">If that address has an account, a reset link is on its way. It works for one hour.</FormMessage>;
  }
  return (
    <form onSubmit={handleSubmit((v) => ask.mutate(v))} className="flex flex-col gap-4" noValidate>
      <Field label="E-mail" type="email" autoComplete="email" registration={register('email')} error={formState.errors.email} />
      {ask.error && <FormMessage kind="error">{ask.error.message}</FormMessage>}
      <SubmitButton busy={ask.isPending}>Send the link</SubmitButton>
    </form>
  );
}

/** The forgot-password island. */
export default withQuery(ForgotForm);
