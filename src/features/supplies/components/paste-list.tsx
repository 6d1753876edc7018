import { useId, useState } from 'react';
import { SUPPLY_CATEGORIES, SUPPLY_CATEGORY_LABELS, type SupplyCategory } from '@shared/schemas/supply';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useCreateSupplies } from '../api/create-supply';
import { parseSupplyLines, type ParsedLine } from '../utils/parse-supply-lines';
import { shopHost } from '../utils/shop-host';
import { fieldError } from './editable-cell';

const EXAMPLE = `2 sheets kraft cardstock
1 sheet patterned paper - for the lid
liquid glue - https://shop.example/glue
a few clear gems`;

type Row = ParsedLine & { include: boolean; category: SupplyCategory };

/**
 * "Paste a list": one supply a line is read into rows (quantity, link, note and a guessed
 * category), shown for checking, and added only when the person confirms.
 */
export function PasteList({ tutorialId, onClose }: { tutorialId: string; onClose: () => void }) {
  const id = useId();
  const [text, setText] = useState('');
  const [rows, setRows] = useState<Row[] | null>(null);
  const [message, setMessage] = useState<{ kind: 'error' | 'success'; text: string } | null>(null);
  const add = useCreateSupplies(tutorialId);

  const read = () => {
    setMessage(null);
    const lines = parseSupplyLines(text);
    if (lines.length === 0) return setMessage({ kind: 'error', text: 'Paste or type at least one supply, one a line.' });
    setRows(lines.map((l) => ({ ...l, include: !l.problem, category: l.supply?.category ?? 'other' })));
  };
  const chosen = rows?.filter((r) => r.include && r.supply && !r.problem) ?? [];
  const confirm = async () => {
    const inputs = chosen.map((r) => ({
      ...r.supply!,
      category: r.category,
      url: r.supply!.url ?? undefined,
      discountCode: r.supply!.discountCode ?? undefined,
    }));
    const { added, refused } = await add.mutateAsync(inputs);
    if (!refused) {
      setRows(null);
      setText('');
      setMessage({ kind: 'success', text: `Added ${added.length} ${added.length === 1 ? 'supply' : 'supplies'} to the list.` });
      return;
    }
    // Keep what was not added in the preview, so nothing typed is lost.
    const done = new Set(chosen.slice(0, added.length));
    setRows((rs) => rs!.filter((r) => !done.has(r)));
    setMessage({ kind: 'error', text: `Added ${added.length} of ${inputs.length}. “${refused.input.name}” was refused: ${fieldError(refused.error, '')}` });
  };

  return (
    <section aria-labelledby={`${id}-title`} className="rounded-lg border border-line bg-white p-4">
      <div className="flex items-baseline justify-between gap-4">
        <h3 id={`${id}-title`} className="text-base">
          Paste a list
        </h3>
        <Button size="sm" variant="ghost" onClick={onClose}>
          Close
        </Button>
      </div>
      {!rows ? (
        <div className="mt-2 space-y-2">
          <label htmlFor={`${id}-text`} className="block text-sm text-pencil">
            One supply a line. A number or amount at the start becomes the quantity, a web address becomes the shop link, text after “ - ” becomes the note; the
            category is guessed from the name. You can check everything before it is added.
          </label>
          <textarea
            id={`${id}-text`}
            rows={6}
            value={text}
            onChange={(e) => setText(e.target.value)}
            placeholder={EXAMPLE}
            className="w-full resize-y rounded-md border border-field bg-white px-3 py-2 font-mono text-sm focus:border-kraft"
          />
          <div className="flex items-center gap-2">
            <Button size="sm" onClick={read} disabled={!text.trim()}>
              Preview the rows
            </Button>
          </div>
        </div>
      ) : (
        <div className="mt-2 space-y-3">
          <p className="text-sm text-pencil">
            Check the rows; untick any you do not want and fix a category if the guess is wrong. Everything stays editable in the table.
          </p>
          <table className="w-full text-left text-sm" aria-label="Rows read from the pasted list">
            <thead className="text-xs text-pencil">
              <tr>
                <th className="w-10 px-2 py-1 font-medium">Add</th>
                <th className="px-2 py-1 font-medium">Category</th>
                <th className="px-2 py-1 font-medium">Name</th>
                <th className="px-2 py-1 font-medium">Quantity</th>
                <th className="px-2 py-1 font-medium">Note</th>
                <th className="px-2 py-1 font-medium">Shop link</th>
                <th className="px-2 py-1 font-medium">Code</th>
              </tr>
            </thead>
            <tbody>
              {rows.map((r, i) => (
                <tr key={`${r.line}-${i}`} className="border-t border-line">
                  <td className="px-2 py-1.5 align-top">
                    <input
                      type="checkbox"
                      className="h-4 w-4 accent-kraft"
                      aria-label={`Add line ${r.line}: ${r.text}`}
                      checked={r.include && !r.problem}
                      disabled={!!r.problem}
                      onChange={(e) => setRows((rs) => rs!.map((x) => (x === r ? { ...x, include: e.target.checked } : x)))}
                    />
                  </td>
                  {r.supply && !r.problem ? (
                    <>
                      <td className="px-2 py-1.5 align-top">
                        <select
                          aria-label={`Category of line ${r.line}`}
                          value={r.category}
                          onChange={(e) => setRows((rs) => rs!.map((x) => (x === r ? { ...x, category: e.target.value as SupplyCategory } : x)))}
                          className="rounded border border-field bg-white px-1 py-0.5 text-sm"
                        >
                          {SUPPLY_CATEGORIES.map((c) => (
                            <option key={c} value={c}>
                              {SUPPLY_CATEGORY_LABELS[c]}
                            </option>
                          ))}
                        </select>
                      </td>
                      <td className="px-2 py-1.5 align-top font-medium">{r.supply.name}</td>
                      <td className="px-2 py-1.5 align-top">{r.supply.quantity || <span className="text-pencil/70">—</span>}</td>
                      <td className="px-2 py-1.5 align-top">{r.supply.note || <span className="text-pencil/70">—</span>}</td>
                      <td className="px-2 py-1.5 align-top">{shopHost(r.supply.url) ?? <span className="text-pencil/70">—</span>}</td>
                      <td className="px-2 py-1.5 align-top">{r.supply.discountCode ?? <span className="text-pencil/70">—</span>}</td>
                    </>
                  ) : (
                    <td colSpan={6} className="px-2 py-1.5 align-top">
                      <span className="text-pencil">
                        Line {r.line}: “{r.text}”
                      </span>{' '}
                      — <span className="text-rosehip">{r.problem}; it will not be added.</span>
                    </td>
                  )}
                </tr>
              ))}
            </tbody>
          </table>
          <div className="flex items-center gap-2">
            <Button size="sm" onClick={() => void confirm()} disabled={chosen.length === 0} busy={add.isPending}>
              Add {chosen.length} {chosen.length === 1 ? 'supply' : 'supplies'}
            </Button>
            <Button size="sm" variant="secondary" onClick={() => (setRows(null), setMessage(null))} disabled={add.isPending}>
              Back to the text
            </Button>
          </div>
        </div>
      )}
      {message && (
        <div className="mt-3">
          <Notice kind={message.kind}>{message.text}</Notice>
        </div>
      )}
    </section>
  );
}
