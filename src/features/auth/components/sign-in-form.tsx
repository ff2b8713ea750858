import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { ApiError } from '@/lib/api-client';
import { useFocusFirstError } from '@/lib/focus-first-error';
import { useLogin } from '../api/login';
import { paths } from '@shared/paths';

export function SignInForm() {
  const login = useLogin();
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const error = login.error instanceof ApiError ? login.error : null;
  const formRef = useFocusFirstError(error);

  function submit(event: FormEvent) {
    event.preventDefault();
    login.mutate(
      { email, password },
      { onSuccess: () => navigate(safeNext(searchParams.get('next')), { replace: true }) },
    );
  }

  return (
    <form ref={formRef} onSubmit={submit} className="flex flex-col gap-4" noValidate>
      <TextField
        label="E-mail"
        type="email"
        autoComplete="email"
        value={email}
        onChange={(e) => setEmail(e.target.value)}
        error={error?.fields.email}
        required
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        value={password}
        onChange={(e) => setPassword(e.target.value)}
        error={error?.fields.password}
        required
      />
      <FormFooter wide error={error} pending={login.isPending} submitLabel="Sign in" pendingLabel="Signing in…" />
      <p className="text-center text-ink-muted">
        New here?{' '}
        <Link to={paths.signUp()} className="font-bold text-action underline underline-offset-4">
          Start a household
        </Link>
      </p>
    </form>
  );
}

/** Only paths inside the app, so a crafted link cannot send someone elsewhere after sign-in. */
export function safeNext(next: string | null) {
  return next && next.startsWith('/') && !next.startsWith('//') ? next : '/';
}
