import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/guard';
import { can } from '@/lib/auth/permissions';
import { listBoard, listCustomers, listStaff } from '@/lib/jobs/job-queries';
import { boardHref } from '@/lib/jobs/board-url';
import { STATUS_LABELS } from '@/lib/jobs/status-flow';
import { boardQuerySchema, JOB_STATUSES, type BoardQuery } from '@/lib/jobs/job-schema';
import { fmt } from '@/lib/presentation/format';

export const metadata = { title: 'Job board' };

type SortKey = BoardQuery['sort'];
const COLUMNS: { key: SortKey | null; label: string; className?: string }[] = [
  { key: 'number', label: 'Job', className: 'num' },
  { key: 'customer', label: 'Customer' },
  { key: null, label: 'Motor' },
  { key: null, label: 'Rating' },
  { key: 'status', label: 'Status' },
  { key: 'priority', label: 'Priority' },
  { key: 'receivedAt', label: 'Received' },
  { key: 'promisedAt', label: 'Promised' },
  { key: null, label: 'Assigned to' },
];

/** Sort keys in words for the table caption ("sorted by promised date, ascending"). */
const SORT_WORDS: Record<BoardQuery['sort'], string> = {
  number: 'job number', promisedAt: 'promised date', receivedAt: 'date received', status: 'status', customer: 'customer', priority: 'priority',
};

export default async function JobBoard({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser('job.read');
  const q = boardQuerySchema.parse(await searchParams);
  const [board, customers, staff] = await Promise.all([listBoard(q), listCustomers(), listStaff()]);
  const statusValue = q.status[0] ?? '';
  return (
    <>
      <div className="row" style={{ justifyContent: 'space-between' }}>
        <h1>Job board</h1>
        {can(user.role, 'job.intake') && <Link className="btn" href="/jobs/new">Log a motor (new intake)</Link>}
      </div>
      <form className="card no-print" method="get" action="/jobs" role="search" aria-label="Filter jobs">
        <div className="grid">
          <div>
            <label htmlFor="q">Search</label>
            <input id="q" name="q" type="search" defaultValue={q.q ?? ''} placeholder="Job no., customer, serial, model" />
          </div>
          <div>
            <label htmlFor="status">Status</label>
            <select id="status" name="status" defaultValue={statusValue}>
              <option value="">All open jobs</option>
              {JOB_STATUSES.map((s) => <option key={s} value={s}>{STATUS_LABELS[s]}</option>)}
            </select>
          </div>
          <div>
            <label htmlFor="customerId">Customer</label>
            <select id="customerId" name="customerId" defaultValue={q.customerId ?? ''}>
              <option value="">Any customer</option>
              {customers.map((c) => <option key={c.id} value={c.id}>{c.company}</option>)}
            </select>
          </div>
          <div>
            <label htmlFor="assigneeId">Assigned to</label>
            <select id="assigneeId" name="assigneeId" defaultValue={q.assigneeId ?? ''}>
              <option value="">Anyone</option>
              <option value="none">Nobody yet</option>
              {staff.map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
            </select>
          </div>
          <div>
            <label htmlFor="due">Due</label>
            <select id="due" name="due" defaultValue={q.due}>
              <option value="any">Any date</option>
              <option value="overdue">Overdue</option>
              <option value="today">Due today</option>
              <option value="week">Due in the next 7 days</option>
            </select>
          </div>
          <div className="row" style={{ alignItems: 'end' }}>
            <button className="btn" type="submit">Apply</button>
            <Link href="/jobs">Clear</Link>
          </div>
        </div>
      </form>
      <p className="muted" role="status">
        {board.total} job{board.total === 1 ? '' : 's'} · page {q.page} of {board.pages}
      </p>
      <div style={{ overflowX: 'auto' }}>
        <table className="board">
          <caption className="sr-only">Jobs, sorted by {SORT_WORDS[q.sort]}, {q.dir === 'asc' ? 'ascending' : 'descending'}</caption>
          <thead>
            <tr>
              {COLUMNS.map((c) => {
                const active = c.key === q.sort;
                return (
                  <th key={c.label} className={c.className} scope="col" aria-sort={active ? (q.dir === 'asc' ? 'ascending' : 'descending') : undefined}>
                    {c.key ? (
                      <Link href={boardHref(q, { sort: c.key, dir: active && q.dir === 'asc' ? 'desc' : 'asc', page: 1 })}>
                        {c.label} {active ? (q.dir === 'asc' ? '▲' : '▼') : ''}
                      </Link>
                    ) : c.label}
                  </th>
                );
              })}
            </tr>
          </thead>
          <tbody>
            {board.rows.map((r) => (
              <tr key={r.id} className={r.overdue ? 'overdue' : undefined}>
                <td className="num"><Link href={`/jobs/${r.number}`}>{r.number}</Link></td>
                <td>{r.customer.company}</td>
                <td>
                  {r.motor.manufacturer} {r.motor.model ?? ''}
                  <div className="small muted">S/N {r.motor.serial ?? '—'}</div>
                </td>
                <td className="small">
                  {fmt.power(r.motor.outputKw)}
                  <div>{fmt.num(r.motor.ratedVoltageV, 0, 'V')} · {fmt.num(r.motor.frequencyHz, 0, 'Hz')} · {fmt.num(r.motor.speedRpm, 0, 'rpm')}</div>
                </td>
                <td>{STATUS_LABELS[r.status]}</td>
                <td>{r.priority === 'NORMAL' ? 'Normal' : <span className={`tag ${r.priority}`}>{r.priority.toLowerCase()}</span>}</td>
                <td>{fmt.date(r.receivedAt)}</td>
                <td>
                  {fmt.date(r.promisedAt)} {r.overdue && <span className="tag overdue">overdue</span>}
                </td>
                <td>{r.assignee?.name ?? <span className="muted">—</span>}</td>
              </tr>
            ))}
            {board.rows.length === 0 && (
              <tr><td colSpan={COLUMNS.length}>No jobs match these filters.</td></tr>
            )}
          </tbody>
        </table>
      </div>
      <nav className="pager no-print" aria-label="Pages">
        {q.page > 1 ? <Link href={boardHref(q, { page: q.page - 1 })}>← Previous</Link> : <span className="muted">← Previous</span>}
        <span>Page {q.page} of {board.pages}</span>
        {q.page < board.pages ? <Link href={boardHref(q, { page: q.page + 1 })}>Next →</Link> : <span className="muted">Next →</span>}
      </nav>
    </>
  );
}
