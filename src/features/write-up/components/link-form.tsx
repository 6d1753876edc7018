import type { Editor } from '@tiptap/core';
import { useEffect, useId, useRef, useState } from 'react';
import { Button } from '@/components/ui/button';
import { linkFromInput } from '../utils/link';

/** A small bar under the toolbar to link the selected text, change a link or remove it. */
export function LinkForm({ editor, onClose }: { editor: Editor; onClose: () => void }) {
  const id = useId();
  const current = (editor.getAttributes('link').href as string | undefined) ?? '';
  const [value, setValue] = useState(current);
  const [error, setError] = useState<string | null>(null);
  const input = useRef<HTMLInputElement>(null);
  useEffect(() => input.current?.focus(), []);

  const apply = () => {
    const href = linkFromInput(value);
    if (!href) {
      setError('Use a web address (https://…), an e-mail address or a link within the site.');
      return;
    }
    const { empty } = editor.state.selection;
    if (empty && !editor.isActive('link')) {
      // Nothing selected: the address itself becomes the linked text.
      editor
        .chain()
        .focus()
        .insertContent({ type: 'text', text: href, marks: [{ type: 'link', attrs: { href } }] })
        .run();
    } else {
      editor.chain().focus().extendMarkRange('link').setLink({ href }).run();
    }
    onClose();
  };

  return (
    <form
      className="flex flex-wrap items-end gap-2 rounded-lg border border-line bg-white px-3 py-2"
      aria-label="Link"
      onSubmit={(e) => {
        e.preventDefault();
        apply();
      }}
      onKeyDown={(e) => {
        if (e.key === 'Escape') {
          e.preventDefault();
          editor.commands.focus();
          onClose();
        }
      }}
    >
      <div className="flex min-w-72 flex-1 flex-col gap-1">
        <label htmlFor={id} className="text-xs font-medium">
          Link address
        </label>
        <input
          ref={input}
          id={id}
          value={value}
          placeholder="https://shop.example/kraft-cardstock"
          onChange={(e) => {
            setValue(e.target.value);
            setError(null);
          }}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className={`rounded-md border bg-white px-2 py-1.5 text-sm focus:border-kraft ${error ? 'border-rosehip' : 'border-field'}`}
        />
      </div>
      <Button type="submit" size="sm">
        {current ? 'Change link' : 'Add link'}
      </Button>
      {current && (
        <Button
          size="sm"
          variant="secondary"
          onClick={() => {
            editor.chain().focus().extendMarkRange('link').unsetLink().run();
            onClose();
          }}
        >
          Remove link
        </Button>
      )}
      <Button
        size="sm"
        variant="ghost"
        onClick={() => {
          editor.commands.focus();
          onClose();
        }}
      >
        Cancel
      </Button>
      {error && (
        <p id={`${id}-error`} role="alert" className="w-full text-xs text-rosehip">
          {error}
        </p>
      )}
    </form>
  );
}
