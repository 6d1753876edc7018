import type { Paper } from '@shared/schemas/publish';
import { PAPERS } from '../utils/paper';

/** Letter or A4, as a two-way switch of radio buttons (a fieldset, so it is one named group). */
export function PaperChoice({ name, value, onChange, label = 'Paper' }: { name: string; value: Paper; onChange: (p: Paper) => void; label?: string }) {
  return (
    <fieldset className="flex items-center gap-2">
      <legend className="sr-only">{label}</legend>
      <span aria-hidden className="text-sm text-pencil">
        {label}
      </span>
      <div className="inline-flex rounded-md border border-line bg-white p-0.5">
        {PAPERS.map((p) => (
          <label
            key={p.key}
            title={p.size}
            className={`cursor-pointer rounded px-2.5 py-1 text-sm has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-kraft ${value === p.key ? 'bg-kraft text-white' : 'text-ink hover:bg-kraft-light'}`}
          >
            <input type="radio" name={name} value={p.key} checked={value === p.key} onChange={() => onChange(p.key)} className="sr-only" />
            {p.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
