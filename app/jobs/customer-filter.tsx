'use client';

import { useEffect, useId, useRef, useState } from 'react';

interface Option {
  id: string;
  company: string;
}

/**
 * The board's customer filter: type part of a name and matching customers load on demand from
 * /api/customers (the page never carries the whole customer list). Choosing one fills the hidden
 * `customerId` the board's form submits; clearing the text clears the filter.
 */
export function CustomerFilter({ initialId, initialName }: { initialId?: string; initialName?: string }) {
  const listId = useId();
  const [text, setText] = useState(initialName ?? '');
  const [id, setId] = useState(initialId ?? '');
  const [options, setOptions] = useState<Option[]>(initialId && initialName ? [{ id: initialId, company: initialName }] : []);
  const [status, setStatus] = useState('');
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);

  useEffect(() => () => clearTimeout(timer.current), []);

  function onChange(value: string) {
    setText(value);
    const exact = options.find((o) => o.company === value);
    setId(exact ? exact.id : '');
    clearTimeout(timer.current);
    const q = value.trim();
    if (q.length < 2 || exact) return;
    timer.current = setTimeout(async () => {
      try {
        const res = await fetch(`/api/customers?q=${encodeURIComponent(q)}`, { headers: { Accept: 'application/json' } });
        if (!res.ok) return setStatus('Customers could not be loaded.');
        const body: { customers: Option[] } = await res.json();
        setOptions(body.customers);
        setStatus(
          body.customers.length
            ? `${body.customers.length} customer${body.customers.length === 1 ? '' : 's'} found`
            : 'No customer matches',
        );
      } catch {
        setStatus('Customers could not be loaded.');
      }
    }, 250);
  }

  return (
    <div>
      <label htmlFor={`${listId}-input`}>Customer</label>
      <input
        id={`${listId}-input`}
        type="search"
        list={listId}
        autoComplete="off"
        value={text}
        placeholder="Type part of a name"
        aria-describedby={`${listId}-status`}
        onChange={(e) => onChange(e.target.value)}
      />
      <datalist id={listId}>
        {options.map((o) => (
          <option key={o.id} value={o.company} />
        ))}
      </datalist>
      <input type="hidden" name="customerId" value={id} />
      <div id={`${listId}-status`} className="small muted" aria-live="polite">
        {status}
      </div>
    </div>
  );
}
