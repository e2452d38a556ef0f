import { useEffect, useState } from 'react';
import { withQuery } from '@/components/WithQuery';
import { CustomerFileView } from './CustomerFileView';
import { useCustomerSearch } from './use-customer-search';

interface Props {
  canEdit: boolean;
  canErase: boolean;
}

// The customer open in the file is kept in the address (?c=id), so a reload or a link opens it again.
function openedInAddress(): string | null {
  return typeof window === 'undefined' ? null : new URL(window.location.href).searchParams.get('c');
}

function Customers({ canEdit, canErase }: Props) {
  const [typed, setTyped] = useState('');
  const [open, setOpen] = useState<string | null>(null);
  useEffect(() => setOpen(openedInAddress()), []);
  const found = useCustomerSearch(typed, { allowEmpty: true });
  const choose = (id: string) => {
    setOpen(id);
    const url = new URL(window.location.href);
    url.searchParams.set('c', id);
    window.history.replaceState(null, '', url);
  };
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,2fr)]">
      <section aria-labelledby="find-title" className="flex min-w-0 flex-col gap-3">
        <h2 id="find-title" className="sr-only">
          Find a customer
        </h2>
        <form role="search" aria-label="Find a customer" onSubmit={(e) => e.preventDefault()} className="flex flex-col gap-1">
          <label htmlFor="customer-q" className="font-semibold">
            Name, phone, e-mail or ticket number
          </label>
          <input
            id="customer-q"
            type="search"
            value={typed}
            onChange={(e) => setTyped(e.target.value)}
            autoComplete="off"
            placeholder="e.g. Quill, 555 0132, 1003"
            className="min-h-12 rounded border-2 border-rule bg-card px-3 py-2 text-lg focus:border-accent"
          />
        </form>
        <p role="status" className="text-sm text-muted">
          {found.isFetching ? 'Searching…' : found.data ? `${found.data.length === 20 ? '20 or more' : found.data.length} found` : ''}
        </p>
        <ul aria-label="Customers found" className="flex flex-col gap-2">
          {found.data?.map((c) => (
            <li key={c.id}>
              <button
                type="button"
                aria-current={open === c.id ? 'true' : undefined}
                onClick={() => choose(c.id)}
                className="flex min-h-11 w-full flex-col items-start rounded border-2 border-rule bg-card px-3 py-2 text-left aria-[current=true]:border-accent aria-[current=true]:bg-accent-soft"
              >
                <span className="text-lg font-semibold [overflow-wrap:anywhere]">{c.name}</span>
                <span className="text-muted [overflow-wrap:anywhere]">
                  {[c.phone, c.email, c.lastTicketLabel ? `last ${c.lastTicketLabel}` : null].filter(Boolean).join(' · ') || 'No contact details'}
                </span>
              </button>
            </li>
          ))}
        </ul>
      </section>
      <div className="min-w-0">
        {open ? (
          <CustomerFileView key={open} id={open} canEdit={canEdit} canErase={canErase} />
        ) : (
          <p className="text-lg text-muted">Find a customer to see their tickets, payments and notices.</p>
        )}
      </div>
    </div>
  );
}

/** The customers screen: search as you type, and the chosen customer's file. */
export default withQuery(Customers);
