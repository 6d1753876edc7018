import { NodeViewWrapper, type NodeViewProps } from '@tiptap/react';
import { groupSupplies, sponsoredTag, supplyDetails } from '@shared/editor/render-parts';
import { paths } from '@/config/paths';
import { useLiveSupplies } from '../../api/get-supplies';
import type { SupplyDto } from '@shared/schemas/supply';
import { useWriteUpContext } from '../write-up-context';
import { LiveFrame } from './live-frame';

// The shared renderers' shape: absent rather than null.
const forRender = (s: SupplyDto) => ({ ...s, url: s.url ?? undefined, discountCode: s.discountCode ?? undefined });
type RenderedSupply = ReturnType<typeof forRender>;

function SupplyItem({ s }: { s: RenderedSupply }) {
  const d = supplyDetails(s);
  return (
    <li>
      {s.url ? (
        <a href={s.url} target="_blank" rel={s.sponsored ? 'sponsored noopener noreferrer' : 'noopener noreferrer'}>
          {s.name}
        </a>
      ) : (
        s.name
      )}
      {sponsoredTag(s) && <span className="wu-mm">{sponsoredTag(s)}</span>}
      <span className="wu-mm">
        {d.quantity}
        {d.note}
      </span>
      {d.code && (
        <span>
          {' '}
          — discount code <strong>{d.code}</strong>
        </span>
      )}
    </li>
  );
}

/** The supplies as a live list, grouped by category, with the disclosure when a link is sponsored. */
export function SupplyListView({ node, editor, updateAttributes, selected }: NodeViewProps) {
  const { tutorialId } = useWriteUpContext();
  const q = useLiveSupplies(tutorialId);
  const grouped = node.attrs.grouped !== false;
  const supplies = q.data?.supplies ?? [];
  const controls = editor.isEditable ? (
    <label className="flex min-h-6 items-center gap-1.5 font-sans text-xs text-pencil">
      <input type="checkbox" className="h-6 w-6 accent-kraft" checked={grouped} onChange={(e) => updateAttributes({ grouped: e.target.checked })} />
      By category
    </label>
  ) : null;
  return (
    <NodeViewWrapper className="wu-live-wrap">
      <LiveFrame
        title="Supplies"
        editTo={paths.tutorialSection(tutorialId, 'supplies')}
        editLabel="Supplies"
        controls={controls}
        selected={selected}
        editable={editor.isEditable}
      >
        {q.isPending ? (
          <p className="wu-live-empty">Loading the supplies …</p>
        ) : q.error ? (
          <p className="wu-live-empty text-rosehip">The supplies could not be loaded: {q.error.message}</p>
        ) : supplies.length === 0 ? (
          <p className="wu-live-empty">No supplies yet. Add them in the Supplies section and they appear here.</p>
        ) : (
          <div className="wu-supplies">
            {q.data?.disclosure.required && <p className="wu-disclosure">{q.data.disclosure.text}</p>}
            {grouped ? (
              groupSupplies(supplies.map(forRender)).map((g) => (
                <div key={g.category}>
                  <h4>{g.label}</h4>
                  <ul>
                    {(g.items as RenderedSupply[]).map((s) => (
                      <SupplyItem key={s.id} s={s} />
                    ))}
                  </ul>
                </div>
              ))
            ) : (
              <ul>
                {supplies.map((s) => (
                  <SupplyItem key={s.id} s={forRender(s)} />
                ))}
              </ul>
            )}
          </div>
        )}
      </LiveFrame>
    </NodeViewWrapper>
  );
}
