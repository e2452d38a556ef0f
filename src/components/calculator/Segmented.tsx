interface Option<T extends string> {
  value: T;
  label: string;
}

interface Props<T extends string> {
  name: string;
  legend: string;
  options: Option<T>[];
  value: T;
  onChange: (value: T) => void;
}

/** A row of radio buttons drawn as one switch: arrow keys move between them, as radios do. */
export function Segmented<T extends string>({ name, legend, options, value, onChange }: Props<T>) {
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 text-base font-semibold">{legend}</legend>
      <div className="flex flex-wrap rounded-md border-2 border-ink bg-card p-0.5">
        {options.map((o) => (
          <label
            key={o.value}
            className={
              'relative flex min-h-11 flex-1 cursor-pointer items-center justify-center rounded px-3 text-lg font-semibold whitespace-nowrap ' +
              'has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-accent ' +
              (o.value === value ? 'bg-ink text-paper' : 'text-ink hover:bg-accent-soft')
            }
          >
            <input type="radio" name={name} value={o.value} checked={o.value === value} onChange={() => onChange(o.value)} className="sr-only" />
            <span className="measure">{o.label}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
