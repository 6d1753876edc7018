import { ScrollArea } from '@/components/ui/scroll-area';
import { useState } from 'react';
import { formatMoney, moneyInputText, parseMoney } from '@shared/money';
import type { KitMaterialDto } from '@shared/schemas/class';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { EmptyState } from '@/components/ui/empty-state';
import { useKitPlan } from '../api/get-kit-plan';
import { useSetMaterialPrice } from '../api/class-mutations';

function PriceCell({ classId, m, currency }: { classId: string; m: KitMaterialDto; currency: string }) {
  const set = useSetMaterialPrice(classId);
  const [text, setText] = useState(m.sheetPriceCents !== null ? moneyInputText(m.sheetPriceCents, m.sheetPriceCurrency ?? currency) : '');
  const [error, setError] = useState<string | null>(null);
  if (!m.materialId) return <span className="text-xs text-rosehip">{m.costNote}</span>;
  const save = () => {
    const cents = text.trim() === '' ? null : parseMoney(text, currency);
    if (text.trim() !== '' && cents === null) return setError('Use an amount like 1.25');
    setError(null);
    set.mutate({ materialId: m.materialId!, sheetPriceCents: cents, sheetPriceCurrency: cents === null ? null : currency });
  };
  return (
    <div className="flex items-center gap-1">
      <input
        aria-label={`Price per sheet of ${m.material} (${currency})`}
        inputMode="decimal"
        className="w-20 rounded-md border border-line px-2 py-1 text-sm"
        value={text}
        onChange={(e) => setText(e.target.value)}
        onBlur={save}
        onKeyDown={(e) => e.key === 'Enter' && save()}
      />
      {error && (
        <span role="alert" className="text-xs text-rosehip">
          {error}
        </span>
      )}
    </div>
  );
}

/** Pieces times kits, sheets per material, cost and margin, and the pre-cut checklist. */
export function KitPlanner({ classId, pdfHref }: { classId: string; pdfHref: (paper: 'letter' | 'a4') => string }) {
  const q = useKitPlan(classId);
  if (q.isPending) return <Loading label="Planning the kits" />;
  if (q.error) return <Notice kind="error">{q.error.message}</Notice>;
  const p = q.data;
  const money = (n: number) => formatMoney(n, p.currency);
  return (
    <section aria-label="Kit planner" className="rounded-lg border border-line bg-white p-4">
      <div className="mb-3 flex flex-wrap items-center gap-3">
        <h2 className="text-xl">Kit planner</h2>
        <span className="text-sm text-pencil">
          {p.kits} kits: {p.seats} seats + {p.spares} spare{p.spares === 1 ? '' : 's'}
        </span>
        {!p.empty && (
          <span className="ml-auto flex gap-2">
            <a className="rounded-md border border-line px-2.5 py-1 text-sm hover:border-kraft" href={pdfHref('letter')} download>
              Kits PDF (Letter)
            </a>
            <a className="rounded-md border border-line px-2.5 py-1 text-sm hover:border-kraft" href={pdfHref('a4')} download>
              Kits PDF (A4)
            </a>
          </span>
        )}
      </div>
      {p.empty ? (
        <EmptyState title="No cut list yet">{p.emptyMessage}</EmptyState>
      ) : (
        <>
          <ScrollArea label="Materials and cost">
            <table className="w-full min-w-[34rem] text-left text-sm">
              <caption className="sr-only">Materials and cost</caption>
              <thead className="text-xs text-pencil">
                <tr>
                  <th className="py-1 pr-2">Material</th>
                  <th className="py-1 pr-2">Stock sheet</th>
                  <th className="py-1 pr-2">Sheets</th>
                  <th className="py-1 pr-2">Price a sheet</th>
                  <th className="py-1">Cost</th>
                </tr>
              </thead>
              <tbody>
                {p.materials.map((m) => (
                  <tr key={m.material} className="border-t border-line align-top">
                    <td className="py-2 pr-2 font-medium">
                      {m.material}
                      {m.errors.map((e) => (
                        <p key={e} className="text-xs font-normal text-rosehip">
                          {e}
                        </p>
                      ))}
                    </td>
                    <td className="py-2 pr-2">{m.sheetLabel}</td>
                    <td className="py-2 pr-2">{m.sheets}</td>
                    <td className="py-2 pr-2">
                      <PriceCell classId={classId} m={m} currency={p.currency} />
                    </td>
                    <td className="py-2">{m.costCents !== null ? money(m.costCents) : <span className="text-xs text-pencil">{m.costNote}</span>}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </ScrollArea>
          <dl className="mt-3 grid grid-cols-2 gap-2 text-sm sm:grid-cols-4">
            <div>
              <dt className="text-pencil">Total</dt>
              <dd className="font-medium">{money(p.totalCostCents)}</dd>
            </div>
            <div>
              <dt className="text-pencil">Per kit</dt>
              <dd className="font-medium">{money(p.costPerKitCents)}</dd>
            </div>
            <div>
              <dt className="text-pencil">Kit fee</dt>
              <dd className="font-medium">{money(p.kitFeeCents)}</dd>
            </div>
            <div>
              <dt className="text-pencil">Margin</dt>
              <dd className={`font-medium ${p.marginCents < 0 ? 'text-rosehip' : ''}`}>
                {money(p.marginCents)} ({money(p.marginPerSeatCents)} a seat)
              </dd>
            </div>
          </dl>
          {!p.complete && <p className="mt-2 text-xs text-rosehip">Some materials have no price yet, so the cost is incomplete.</p>}
          <details className="mt-2 text-xs text-pencil">
            <summary>Working</summary>
            <ul className="mt-1 list-disc pl-5">
              {p.working.map((w) => (
                <li key={w}>{w}</li>
              ))}
            </ul>
          </details>
          <h3 className="mt-5 text-lg">Pre-cut checklist</h3>
          <ScrollArea label="Pre-cut checklist">
            <table className="w-full min-w-[34rem] text-left text-sm">
              <thead className="text-xs text-pencil">
                <tr>
                  <th className="py-1 pr-2">Piece</th>
                  <th className="py-1 pr-2">Material</th>
                  <th className="py-1 pr-2">Per kit</th>
                  <th className="py-1 pr-2">In all</th>
                  <th className="py-1">Size</th>
                </tr>
              </thead>
              <tbody>
                {p.pieces.map((x) => (
                  <tr key={`${x.name}-${x.material}`} className="border-t border-line">
                    <td className="py-2 pr-2 font-medium">{x.name}</td>
                    <td className="py-2 pr-2">{x.material}</td>
                    <td className="py-2 pr-2">{x.perKit}</td>
                    <td className="py-2 pr-2">{x.total}</td>
                    <td className="py-2">
                      {x.sizeInches} <span className="text-pencil">{x.sizeMm}</span>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </ScrollArea>
          <p className="mt-2 text-xs text-pencil">The PDF has a box to tick for each kit beside every piece.</p>
        </>
      )}
    </section>
  );
}
