// Sign-in: e-mail and password, then on to where the visitor was going.
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import { signInInput } from '@/lib/shared/account-inputs';
import { fetchJson } from '@/lib/shared/fetch-json';
import { withQuery } from '@/components/WithQuery';
import { Field, FormMessage, SubmitButton } from '@/components/Field';

type Input = z.infer<typeof signInInput>;

function SignInForm({ next }: { next: string }) {
  const { register, handleSubmit, formState } = useForm<Input>({ resolver: zodResolver(signInInput) });
  const signIn = useMutation({
    mutationFn: (input: Input) => fetchJson('/api/auth/sign-in/email', { body: input }),
    onSuccess: () => window.location.assign(next),
  });
  return (
    <form onSubmit={handleSubmit((v) => signIn.mutate(v))} className="flex flex-col gap-4" noValidate>
      <Field label="E-mail" type="email" autoComplete="email" registration={register('email')} error={formState.errors.email} />
      <Field label="Password" type="password" autoComplete="current-password" registration={register('password')} error={formState.errors.password} />
      {signIn.error && (
        <FormMessage kind="error">
          {signIn.error.message === 'Invalid email or password' ? 'That e-mail and password do not match.' : signIn.error.message}
        </FormMessage>
      )}
      <SubmitButton busy={signIn.isPending || signIn.isSuccess}>Sign in</SubmitButton>
    </form>
  );
}

/** The sign-in island. */
export default withQuery(SignInForm);
