import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useFocusFirstError } from '@/lib/focus-first-error';
import { useSignup } from '../api/signup';
import { paths } from '@shared/paths';

export function SignUpForm() {
  const signup = useSignup();
  const [form, setForm] = useState({ name: '', email: '', password: '', householdName: '' });
  const error = signup.error instanceof ApiError ? signup.error : null;
  const formRef = useFocusFirstError(error);
  const set = (key: keyof typeof form) => (event: { target: { value: string } }) =>
    setForm({ ...form, [key]: event.target.value });

  function submit(event: FormEvent) {
    event.preventDefault();
    signup.mutate(form);
  }

  if (signup.data) {
    return (
      <div className="flex flex-col gap-4">
        <Notice tone="action" role="status" title="Check your e-mail">
          {signup.data.message}
        </Notice>
        <p className="text-ink-muted">
          Open the link in that e-mail to finish. Nothing arrived? Check the address, look in your spam folder, or try
          again.
        </p>
        <Button variant="secondary" onClick={() => signup.reset()}>
          Use another address
        </Button>
      </div>
    );
  }

  return (
    <form ref={formRef} onSubmit={submit} className="flex flex-col gap-4" noValidate>
      <TextField
        label="Your name"
        autoComplete="name"
        value={form.name}
        onChange={set('name')}
        error={error?.fields.name}
        required
      />
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        value={form.email}
        onChange={set('email')}
        error={error?.fields.email}
        required
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        value={form.password}
        onChange={set('password')}
        error={error?.fields.password}
        hint="At least 10 characters. A short sentence is easy to remember."
        required
      />
      <TextField
        label="Household name"
        value={form.householdName}
        onChange={set('householdName')}
        error={error?.fields.householdName}
        hint="You will be its keeper, and can invite the others later."
        required
      />
      <FormFooter
        wide
        error={error}
        pending={signup.isPending}
        submitLabel="Create household"
        pendingLabel="Sending your link…"
      />
      <p className="text-center text-ink-muted">
        Already have an account?{' '}
        <Link to={paths.signIn()} className="font-bold text-action underline underline-offset-4">
          Sign in
        </Link>
      </p>
    </form>
  );
}
