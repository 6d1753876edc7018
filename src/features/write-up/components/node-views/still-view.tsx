import { NodeViewWrapper, type NodeViewProps } from '@tiptap/react';
import { useEffect, useId, useRef, useState } from 'react';
import type { StillAttrs } from '@shared/editor';

/**
 * Caption and alt text fields that keep their own text while focused, so the node's update (one
 * transaction a keystroke) never moves the cursor in the field.
 */
function AttrField({
  label,
  value,
  onChange,
  multiline,
  describedBy,
}: {
  label: string;
  value: string;
  onChange: (v: string) => void;
  multiline?: boolean;
  describedBy?: string;
}) {
  const id = useId();
  const [text, setText] = useState(value);
  const focused = useRef(false);
  useEffect(() => {
    if (!focused.current) setText(value);
  }, [value]);
  const props = {
    id,
    value: text,
    'aria-describedby': describedBy,
    onFocus: () => (focused.current = true),
    onBlur: () => (focused.current = false),
    onChange: (e: { target: { value: string } }) => {
      setText(e.target.value);
      onChange(e.target.value);
    },
    className: 'w-full rounded border border-field bg-white px-2 py-1 font-sans text-sm text-ink focus:border-kraft',
  };
  return (
    <div className="flex flex-col gap-0.5">
      <label htmlFor={id} className="font-sans text-xs font-medium text-ink">
        {label}
      </label>
      {multiline ? <textarea rows={2} {...props} /> : <input type="text" {...props} />}
    </div>
  );
}

/** A photo with its caption and alt text; the alt text is asked for in words when it is missing. */
export function StillView({ node, editor, updateAttributes, deleteNode, selected }: NodeViewProps) {
  const a = node.attrs as StillAttrs;
  const editable = editor.isEditable;
  const warnId = useId();
  const noAlt = !a.alt?.trim();
  const [failed, setFailed] = useState<string | null>(null);
  return (
    <NodeViewWrapper as="figure" className={`wu-still${selected ? ' is-selected' : ''}`} data-still-id={a.stillId ?? undefined}>
      <img
        src={a.src}
        alt={a.alt ?? ''}
        width={a.width ?? undefined}
        height={a.height ?? undefined}
        loading="lazy"
        data-drag-handle={editable ? '' : undefined}
        draggable={editable}
        className="wu-still-image"
        onError={() => setFailed(a.src)}
        onLoad={() => setFailed(null)}
      />
      {failed === a.src && (
        <p className="font-sans text-xs text-rosehip" contentEditable={false}>
          ⚠ This photo could not be shown. Check that its address still works, or pick a still from the footage instead.
        </p>
      )}
      {editable ? (
        <div className="wu-still-fields" contentEditable={false}>
          <AttrField label="Caption" value={a.caption ?? ''} onChange={(caption) => updateAttributes({ caption })} />
          <AttrField label="Alt text" value={a.alt ?? ''} onChange={(alt) => updateAttributes({ alt })} multiline describedBy={noAlt ? warnId : undefined} />
          <div className="flex items-start justify-between gap-3">
            {noAlt ? (
              <p id={warnId} className="font-sans text-xs text-rosehip">
                ⚠ No alt text yet: say what the photo shows, for readers who cannot see it.
              </p>
            ) : (
              <span />
            )}
            <button type="button" onClick={deleteNode} className="min-h-6 shrink-0 px-1 font-sans text-xs text-pencil underline hover:text-rosehip">
              Remove photo
            </button>
          </div>
        </div>
      ) : (
        a.caption && <figcaption className="wu-still-caption">{a.caption}</figcaption>
      )}
    </NodeViewWrapper>
  );
}
