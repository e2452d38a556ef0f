import { useId, useState, type KeyboardEvent } from 'react';
import type { CustomerHit } from '@/lib/shared/customer-types';
import { useCustomerSearch } from './use-customer-search';

interface Props {
  /** the input's id, for its label */
  id: string;
  label: string;
  /** the customer chosen, shown instead of the box until "Change" */
  chosen: CustomerHit | null;
  onChoose: (c: CustomerHit | null) => void;
  error?: string;
  hint?: string;
}

const BOX = 'min-h-12 w-full rounded border-2 border-rule bg-card px-3 py-2 text-lg focus:border-accent';

/** What a found customer is shown as: name, phone, latest ticket. */
export function hitText(c: CustomerHit): string {
  return [c.name, c.phone, c.lastTicketLabel ? `last ${c.lastTicketLabel}` : null].filter(Boolean).join(' · ');
}

/** A search box over the shop's customers (name, phone, e-mail, ticket number) with its results as a
 * listbox: arrows move, Enter chooses, Escape closes; the ARIA combobox pattern. */
export function CustomerSearch({ id, label, chosen, onChoose, error, hint }: Props) {
  const [typed, setTyped] = useState('');
  const [active, setActive] = useState(0);
  const list = `${useId()}-list`;
  const found = useCustomerSearch(typed, { enabled: !chosen });
  // Only the answer for what stands in the box is offered: Enter must not pick a stale one.
  const hits = typed.trim() && found.current ? (found.data ?? []) : [];
  const choose = (c: CustomerHit) => {
    onChoose(c);
    setTyped('');
  };
  const onKey = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'ArrowDown') setActive((i) => Math.min(i + 1, hits.length - 1));
    else if (e.key === 'ArrowUp') setActive((i) => Math.max(i - 1, 0));
    else if (e.key === 'Enter' && hits[active]) choose(hits[active]!);
    else if (e.key === 'Escape') setTyped('');
    else return;
    e.preventDefault();
  };
  if (chosen) {
    return (
      <div className="flex flex-col gap-1">
        <span className="font-semibold">{label}</span>
        <div className="flex flex-wrap items-center gap-3 rounded border-2 border-ok bg-card px-3 py-2 text-lg">
          <span className="min-w-0 [overflow-wrap:anywhere]" data-testid="chosen-customer">
            {hitText(chosen)}
          </span>
          <button type="button" onClick={() => onChoose(null)} className="ml-auto min-h-11 rounded border-2 border-ink px-3 font-semibold">
            Change
          </button>
        </div>
      </div>
    );
  }
  const open = hits.length > 0;
  return (
    <div className="relative flex flex-col gap-1">
      <label htmlFor={id} className="font-semibold">
        {label}
      </label>
      <input
        id={id}
        type="search"
        role="combobox"
        aria-expanded={open}
        aria-controls={list}
        aria-autocomplete="list"
        aria-activedescendant={open ? `${list}-${active}` : undefined}
        aria-invalid={error ? true : undefined}
        aria-describedby={[error ? `${id}-error` : '', hint ? `${id}-hint` : ''].filter(Boolean).join(' ') || undefined}
        value={typed}
        onChange={(e) => {
          setTyped(e.target.value);
          setActive(0);
        }}
        onKeyDown={onKey}
        autoComplete="off"
        placeholder="Name, phone, e-mail or ticket no."
        className={BOX}
      />
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-muted">
          {hint}
        </p>
      )}
      <ul id={list} role="listbox" aria-label="Customers found" hidden={!open} className="flex flex-col rounded border-2 border-rule bg-card">
        {hits.map((c, i) => (
          <li
            key={c.id}
            id={`${list}-${i}`}
            role="option"
            aria-selected={i === active}
            onMouseDown={(e) => e.preventDefault()}
            onClick={() => choose(c)}
            className="flex min-h-11 cursor-pointer items-center border-b border-rule px-3 py-2 text-lg last:border-b-0 aria-selected:bg-paper aria-selected:font-semibold [overflow-wrap:anywhere]"
          >
            {hitText(c)}
          </li>
        ))}
      </ul>
      {typed.trim() && found.current && hits.length === 0 && (
        <p role="status" className="text-muted">
          Nobody found for “{typed.trim()}”.
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="rounded-sm border-l-4 border-cut bg-cut-soft px-2 py-1 text-base font-semibold text-cut">
          {error}
        </p>
      )}
    </div>
  );
}
