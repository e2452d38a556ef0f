// Sign-up: a new shop and its first lead.
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation } from '@tanstack/react-query';
import type { z } from 'zod';
import { shopSignUpInput } from '@/lib/shared/account-inputs';
import { fetchJson } from '@/lib/shared/fetch-json';
import { withQuery } from '@/components/WithQuery';
import { Field, FormMessage, SubmitButton } from '@/components/Field';

type Input = z.infer<typeof shopSignUpInput>;

function SignUpForm() {
  const { register, handleSubmit, formState } = useForm<Input>({ resolver: zodResolver(shopSignUpInput) });
  const signUp = useMutation({
    mutationFn: (input: Input) => fetchJson('/api/shops', { body: input }),
    onSuccess: () => window.location.assign('/staff'),
  });
  return (
    <form onSubmit={handleSubmit((v) => signUp.mutate(v))} className="flex flex-col gap-4" noValidate>
      <Field label="Shop name" autoComplete="organization" registration={register('shopName')} error={formState.errors.shopName} />
      <Field label="Your name" autoComplete="name" registration={register('name')} error={formState.errors.name} />
      <Field label="E-mail" type="email" autoComplete="email" registration={register('email')} error={formState.errors.email} />
      <Field
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        registration={register('password')}
        error={formState.errors.password}
      />
      {signUp.error && <FormMessage kind="error">{signUp.error.message}</FormMessage>}
      <SubmitButton busy={signUp.isPending || signUp.isSuccess}>Open the shop</SubmitButton>
    </form>
  );
}

/** The sign-up island. */
export default withQuery(SignUpForm);
