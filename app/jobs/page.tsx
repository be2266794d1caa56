import Link from 'next/link';
import { requirePageUser } from '@/lib/auth/guard';
import { can } from '@/lib/auth/permissions';
import { customerName, listBoard, listStaff } from '@/lib/jobs/job-queries';
import { boardHref, sortInWords } from '@/lib/jobs/board-url';
import { CustomerFilter } from './customer-filter';
import { STATUS_LABELS } from '@/lib/jobs/status-flow';
import { boardQuerySchema, boardSearchRefusal, JOB_STATUSES, type BoardQuery } from '@/lib/jobs/job-schema';
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

/** The "start at" field for sorts that have one: a date, a job number or the start of a name. */
const JUMP_INPUT: Partial<Record<SortKey, { label: string; type: 'date' | 'text' }>> = {
  promisedAt: { label: 'Start at promised date', type: 'date' },
  receivedAt: { label: 'Start at date received', type: 'date' },
  number: { label: 'Start at job number', type: 'text' },
  customer: { label: 'Start at customer name', type: 'text' },
};

export default async function JobBoard({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requirePageUser('job.read');
  const raw = await searchParams;
  const q = boardQuerySchema.parse(raw);
  const qRefusal = boardSearchRefusal(raw.q);
  const [board, chosenCustomer, staff] = await Promise.all([listBoard(q), q.customerId ? customerName(q.customerId) : null, listStaff()]);
  const statusValue = q.status[0] ?? '';
  const jumpKind = JUMP_INPUT[q.sort];
  return (
    <>
      <div className="row" style={{ justifyContent: 'space-between' }}>
        <h1>Job board</h1>
        {can(user.role, 'job.intake') && (
          <Link className="btn" href="/jobs/new">
            Log a motor (new intake)
          </Link>
        )}
      </div>
      <form className="card no-print" method="get" action="/jobs" role="search" aria-label="Filter jobs">
        <div className="grid">
          <div>
            <label htmlFor="q">Search</label>
            <input
              id="q"
              name="q"
              type="search"
              defaultValue={q.q ?? ''}
              placeholder="Job no., customer, serial, model"
              maxLength={80}
              aria-invalid={qRefusal ? true : undefined}
              aria-describedby={qRefusal ? 'q-error' : undefined}
            />
            {qRefusal && (
              <p id="q-error" className="field-error">
                {qRefusal}
              </p>
            )}
          </div>
          <div>
            <label htmlFor="status">Status</label>
            <select id="status" name="status" defaultValue={statusValue}>
              <option value="">Open jobs</option>
              <option value="ANY">Any status (shipped and returned included)</option>
              {JOB_STATUSES.map((s) => (
                <option key={s} value={s}>
                  {STATUS_LABELS[s]}
                </option>
              ))}
            </select>
          </div>
          <CustomerFilter initialId={q.customerId} initialName={chosenCustomer ?? undefined} />
          <div>
            <label htmlFor="assigneeId">Assigned to</label>
            <select id="assigneeId" name="assigneeId" defaultValue={q.assigneeId ?? ''}>
              <option value="">Anyone</option>
              <option value="none">Nobody yet</option>
              {staff.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name}
                </option>
              ))}
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
            <button className="btn" type="submit">
              Apply
            </button>
            <Link href="/jobs">Clear</Link>
          </div>
        </div>
      </form>
      <p className="muted" role="status">
        {board.capped ? `More than ${fmt.int(board.count)} jobs` : `${fmt.int(board.count)} job${board.count === 1 ? '' : 's'}`}
        {' · '}
        {board.scope === 'any' ? 'every status' : board.scope === 'open' ? 'open jobs' : 'chosen statuses'}
        {' · '}
        {sortInWords(q)}
        {board.scope === 'any' && !q.status.includes('ANY') ? ' (a search with a number looks across every status)' : ''}
      </p>
      <div style={{ overflowX: 'auto' }}>
        <table className="board">
          <caption className="sr-only">Jobs, {sortInWords(q)}</caption>
          <thead>
            <tr>
              {COLUMNS.map((c) => {
                const active = c.key === q.sort;
                return (
                  <th
                    key={c.label}
                    className={c.className}
                    scope="col"
                    aria-sort={active ? (q.dir === 'asc' ? 'ascending' : 'descending') : undefined}
                  >
                    {c.key ? (
                      <Link href={boardHref(q, { sort: c.key, dir: active && q.dir === 'asc' ? 'desc' : 'asc' })}>
                        {c.label} {active ? (q.dir === 'asc' ? '▲' : '▼') : ''}
                      </Link>
                    ) : (
                      c.label
                    )}
                  </th>
                );
              })}
            </tr>
          </thead>
          <tbody>
            {board.rows.map((r) => (
              <tr key={r.id} className={r.overdue ? 'overdue' : undefined}>
                <td className="num">
                  <Link href={`/jobs/${r.number}`}>{r.number}</Link>
                </td>
                <td>{r.customerName}</td>
                <td>
                  {r.motor.manufacturer} {r.motor.model ?? ''}
                  <div className="small muted">S/N {r.motor.serial ?? '—'}</div>
                </td>
                <td className="small">
                  {fmt.power(r.motor.outputKw)}
                  <div>
                    {fmt.num(r.motor.ratedVoltageV, 0, 'V')} · {fmt.num(r.motor.frequencyHz, 0, 'Hz')} ·{' '}
                    {fmt.num(r.motor.speedRpm, 0, 'rpm')}
                  </div>
                </td>
                <td>{STATUS_LABELS[r.status]}</td>
                <td>{r.priority === 'NORMAL' ? 'Normal' : <span className={`tag ${r.priority}`}>{r.priority.toLowerCase()}</span>}</td>
                <td>{fmt.date(r.receivedAt)}</td>
                <td>
                  {fmt.day(r.promisedAt)} {r.overdue && <span className="tag overdue">overdue</span>}
                </td>
                <td>{r.assignee?.name ?? <span className="muted">—</span>}</td>
              </tr>
            ))}
            {board.rows.length === 0 && (
              <tr>
                <td colSpan={COLUMNS.length}>No jobs match these filters.</td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
      <nav className="pager no-print" aria-label="Pages">
        {board.previous ? (
          <Link href={boardHref(q, { before: board.previous })}>← Previous</Link>
        ) : (
          <span className="muted">← Previous</span>
        )}
        <Link href={boardHref(q, {})}>First page</Link>
        {board.next ? <Link href={boardHref(q, { after: board.next })}>Next →</Link> : <span className="muted">Next →</span>}
      </nav>
      {jumpKind && (
        <form className="row no-print" method="get" action="/jobs" aria-label="Jump to a position">
          {q.status.map((st) => (
            <input key={st} type="hidden" name="status" value={st} />
          ))}
          {q.customerId && <input type="hidden" name="customerId" value={q.customerId} />}
          {q.assigneeId && <input type="hidden" name="assigneeId" value={q.assigneeId} />}
          {q.due !== 'any' && <input type="hidden" name="due" value={q.due} />}
          {q.q && <input type="hidden" name="q" value={q.q} />}
          <input type="hidden" name="sort" value={q.sort} />
          <input type="hidden" name="dir" value={q.dir} />
          <label htmlFor="from">{jumpKind.label}</label>
          <input
            id="from"
            name="from"
            type={jumpKind.type}
            defaultValue={q.from ?? ''}
            inputMode={jumpKind.type === 'text' && q.sort === 'number' ? 'numeric' : undefined}
          />
          <button className="btn" type="submit">
            Go
          </button>
        </form>
      )}
    </>
  );
}
