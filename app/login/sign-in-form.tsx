'use client';

import { useActionState } from 'react';
import { signIn, type SignInState } from '@/lib/auth/auth-actions';

export function SignInForm({ next }: { next: string | undefined }) {
  const [state, action, pending] = useActionState<SignInState, FormData>(signIn, {});
  return (
    <form action={action} noValidate>
      <div role="alert" aria-live="assertive">
        {state.message && <p className="notice bad">{state.message}</p>}
      </div>
      {next && <input type="hidden" name="next" value={next} />}
      <p>
        <label htmlFor="email">Email</label>
        <input
          id="email"
          name="email"
          type="email"
          autoComplete="username"
          required
          defaultValue={state.email}
          aria-invalid={!!state.fieldErrors?.email}
          aria-describedby={state.fieldErrors?.email ? 'email-error' : undefined}
        />
        {state.fieldErrors?.email && (
          <span id="email-error" className="field-error">
            {state.fieldErrors.email}
          </span>
        )}
      </p>
      <p>
        <label htmlFor="password">Password</label>
        <input
          id="password"
          name="password"
          type="password"
          autoComplete="current-password"
          required
          aria-invalid={!!state.fieldErrors?.password}
          aria-describedby={state.fieldErrors?.password ? 'password-error' : undefined}
        />
        {state.fieldErrors?.password && (
          <span id="password-error" className="field-error">
            {state.fieldErrors.password}
          </span>
        )}
      </p>
      <button className="btn" type="submit" disabled={pending}>
        {pending ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  );
}
