'use server';

/**
 * Redesign actions. Requests and choices need 'redesign.edit' (engineers, administrators); approval needs
 * 'redesign.approve', which only engineers hold. guardedAction checks session and role before anything.
 */
import { guardedAction } from '@/lib/auth/guard';
import { success } from '@/lib/errors/action-result';
import { approveRedesignSchema, chooseCandidateSchema, redesignRequestFormSchema, requestFromForm } from '@/lib/redesign/redesign-schema';
import { approveRedesign, chooseRedesignCandidate, saveRedesignRequest } from './redesign-writes';

export async function submitRedesignRequest(raw: unknown) {
  return guardedAction('redesign.edit', 'prepare redesigns', redesignRequestFormSchema, async (user, input) => {
    const r = await saveRedesignRequest(user, input.jobId, input.draftVersion, requestFromForm(input));
    return success(r, `Revision ${r.revision}: candidates found. Choose one below.`);
  })(raw);
}

export async function chooseCandidate(raw: unknown) {
  return guardedAction('redesign.edit', 'prepare redesigns', chooseCandidateSchema, async (user, input) => {
    const r = await chooseRedesignCandidate(user, input);
    return success(r, `Candidate ${r.rank} chosen. Check the comparison, then approve.`);
  })(raw);
}

export async function approveRedesignRevision(raw: unknown) {
  return guardedAction(
    'redesign.approve',
    'approve a redesign: only an engineer may approve one',
    approveRedesignSchema,
    async (user, input) => {
      const r = await approveRedesign(user, input);
      return success(r, `Revision ${r.revision} approved and frozen. The winder can print it now.`);
    },
  )(raw);
}
