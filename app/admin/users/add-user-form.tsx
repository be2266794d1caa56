'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { ROLES, userCreateSchema, type UserCreateInput } from '@/lib/users/user-schema';
import { ROLE_LABELS } from '@/lib/auth/permissions';
import { addUser } from '@/lib/users/user-actions';
import { applyFieldErrors } from '@/lib/errors/form-errors';
import { Field, InputField, describe } from '@/app/_components/field';
import { FormStatus } from '@/app/_components/form-status';
import { callAction } from '@/lib/errors/call-action';

export function AddUserForm() {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm<UserCreateInput, unknown, z.output<typeof userCreateSchema>>({
    resolver: zodResolver(userCreateSchema),
    defaultValues: { name: '', email: '', role: 'WINDER', password: '' },
  });
  const onSubmit = handleSubmit((values) =>
    startTransition(async () => {
      const result = await callAction(() => addUser(values));
      if (result.ok) {
        setSummary({ tone: 'ok', text: result.message ?? 'Added.' });
        reset();
        router.refresh();
      } else {
        applyFieldErrors(result.fieldErrors, setError);
        setSummary({ tone: 'bad', text: result.message });
      }
    }),
  );
  return (
    <form onSubmit={onSubmit} noValidate>
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      <div className="grid">
        <InputField id="new-name" label="Name *" error={errors.name?.message} registration={register('name')} />
        <InputField id="new-email" label="Email *" type="email" error={errors.email?.message} registration={register('email')} />
        <Field id="new-role" label="Role *" error={errors.role?.message}>
          <select {...register('role')} {...describe('new-role', errors.role?.message)}>
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </select>
        </Field>
        <Field
          id="new-password"
          label="First password *"
          hint="At least 10 characters; they can change it with an administrator."
          error={errors.password?.message}
        >
          <input
            type="password"
            autoComplete="new-password"
            {...register('password')}
            {...describe('new-password', errors.password?.message, 'hint')}
          />
        </Field>
      </div>
      <button className="btn" type="submit" disabled={pending}>
        {pending ? 'Adding…' : 'Add person'}
      </button>
    </form>
  );
}
