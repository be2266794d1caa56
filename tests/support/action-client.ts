/**
 * Calls server actions of a running production build over HTTP, as the browser does: POST to a page that
 * uses the action with its id in `Next-Action` and the arguments as JSON. Ids come from the build's
 * server-reference manifest (file + exported name), so tests name actions, not hashes.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { z } from 'zod';

const manifestSchema = z.object({
  node: z.record(z.string(), z.object({ workers: z.record(z.string(), z.unknown()), filename: z.string(), exportedName: z.string() })),
});

export interface ActionRef {
  id: string;
  name: string;
  file: string;
  /** A page that imports the action, e.g. app/jobs/[number]/page. */
  page: string;
}

export function listActions(root = process.cwd()): ActionRef[] {
  const { node } = manifestSchema.parse(JSON.parse(readFileSync(join(root, '.next', 'server', 'server-reference-manifest.json'), 'utf8')));
  return Object.entries(node)
    .filter(([, e]) => e.filename.startsWith('lib/'))
    .map(([id, e]) => ({ id, name: e.exportedName, file: e.filename, page: Object.keys(e.workers)[0] ?? 'app/page' }));
}

/** A URL path for a page route, with a real job number in place of [number]. */
export function pagePath(page: string, jobNumber: number): string {
  const p = page
    .replace(/^app/, '')
    .replace(/\/page$/, '')
    .replace('[number]', String(jobNumber));
  return p === '' ? '/' : p;
}

export interface ActionReply {
  status: number;
  /** The action's return value when the reply carried one. */
  result: unknown;
  text: string;
}

export async function callActionOverHttp(
  baseUrl: string,
  action: ActionRef,
  path: string,
  args: unknown[],
  cookie: string,
): Promise<ActionReply> {
  const res = await fetch(`${baseUrl}${path}`, {
    method: 'POST',
    headers: {
      'Next-Action': action.id,
      'Content-Type': 'text/plain;charset=UTF-8',
      Accept: 'text/x-component',
      Origin: baseUrl,
      Cookie: cookie,
    },
    body: JSON.stringify(args),
    redirect: 'manual',
  });
  const text = await res.text();
  let result: unknown;
  for (const line of text.split('\n')) {
    const m = /^1:(\{.*\})$/.exec(line);
    if (m?.[1]) {
      try {
        result = JSON.parse(m[1]);
      } catch {
        /* not the result row */
      }
    }
  }
  return { status: res.status, result, text };
}
