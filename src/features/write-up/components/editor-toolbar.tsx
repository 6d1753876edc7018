import type { Editor } from '@tiptap/core';
import { useEditorState } from '@tiptap/react';
import type { ReactNode } from 'react';
import { insertLiveList, insertStepHere } from '../utils/editor-commands';
import { keyLabel } from '../utils/format';
import { ariaKeys, isMac, SHORTCUTS } from './shortcuts';

type ToolProps = {
  label: string;
  hint: string;
  keys?: string;
  active?: boolean;
  disabled?: boolean;
  onClick: () => void;
  children?: ReactNode;
  className?: string;
};

function Tool({ label, hint, keys, active, disabled, onClick, children, className = '' }: ToolProps) {
  const mac = isMac();
  const tip = keys ? `${hint} (${keyLabel(keys, mac)})` : hint;
  return (
    <button
      type="button"
      title={tip}
      aria-label={label}
      aria-pressed={active === undefined ? undefined : active}
      aria-keyshortcuts={keys ? ariaKeys(keys, mac) : undefined}
      disabled={disabled}
      // Keep the editor's selection: a click on the toolbar must not move focus away first.
      onMouseDown={(e) => e.preventDefault()}
      onClick={onClick}
      className={`rounded px-2 py-1 text-sm transition-colors disabled:cursor-not-allowed disabled:text-pencil/60 ${
        active ? 'bg-kraft-light text-kraft-dark' : 'text-ink hover:bg-kraft-light/60'
      } ${className}`}
    >
      {children ?? label}
    </button>
  );
}

const Divider = () => <span className="mx-1 h-5 w-px bg-line" aria-hidden />;

/** The write-up's toolbar: our nodes first (Step, Still, Cut list, Supplies, Tip, Caution), then text formatting. */
export function EditorToolbar({ editor, onStill, onLink, status }: { editor: Editor; onStill: () => void; onLink: () => void; status?: ReactNode }) {
  const s = useEditorState({
    editor,
    selector: ({ editor: e }) => ({
      heading: e.isActive('heading'),
      bold: e.isActive('bold'),
      italic: e.isActive('italic'),
      link: e.isActive('link'),
      list: e.isActive('bulletList'),
      numbered: e.isActive('orderedList'),
      tip: e.isActive('tip'),
      caution: e.isActive('caution'),
      canHeading: e.can().toggleHeading({ level: 2 }),
      canBold: e.can().toggleBold(),
      canItalic: e.can().toggleItalic(),
      canList: e.can().toggleBulletList(),
      canNumbered: e.can().toggleOrderedList(),
      canTip: e.can().toggleTip(),
      canCaution: e.can().toggleCaution(),
      inTitle: e.state.selection.$from.parent.type.name === 'stepTitle',
    }),
  });
  const chain = () => editor.chain().focus();
  return (
    <div
      role="toolbar"
      aria-label="Write-up tools"
      className="sticky top-0 z-20 flex flex-wrap items-center gap-0.5 rounded-lg border border-line bg-white/95 px-2 py-1 shadow-sm backdrop-blur"
    >
      <Tool label="Step" hint="New step after this one" keys={SHORTCUTS.step} onClick={() => insertStepHere(editor)} className="font-medium">
        + Step
      </Tool>
      <Tool label="Still" hint="Put in a still from the footage" keys={SHORTCUTS.still} onClick={onStill}>
        + Still
      </Tool>
      <Tool label="Cut list" hint="Put in the live cut list" onClick={() => insertLiveList(editor, 'cutList')}>
        + Cut list
      </Tool>
      <Tool label="Supplies" hint="Put in the live supplies list" onClick={() => insertLiveList(editor, 'supplyList')}>
        + Supplies
      </Tool>
      <Tool label="Tip" hint="Make the selected text a tip, or undo it" active={s.tip} disabled={!s.canTip} onClick={() => chain().toggleTip().run()}>
        <span className="text-sage">✎</span> Tip
      </Tool>
      <Tool
        label="Caution"
        hint="Make the selected text a caution, or undo it"
        active={s.caution}
        disabled={!s.canCaution}
        onClick={() => chain().toggleCaution().run()}
      >
        <span className="text-rosehip">⚠</span> Caution
      </Tool>
      <Divider />
      <Tool
        label="Heading"
        hint="Section heading"
        keys={SHORTCUTS.heading}
        active={s.heading}
        disabled={!s.canHeading || s.inTitle}
        onClick={() => chain().toggleHeading({ level: 2 }).run()}
        className="font-serif"
      >
        Heading
      </Tool>
      <Tool
        label="Bold"
        hint="Bold"
        keys={SHORTCUTS.bold}
        active={s.bold}
        disabled={!s.canBold}
        onClick={() => chain().toggleBold().run()}
        className="font-bold"
      >
        Bold
      </Tool>
      <Tool
        label="Italic"
        hint="Italic"
        keys={SHORTCUTS.italic}
        active={s.italic}
        disabled={!s.canItalic}
        onClick={() => chain().toggleItalic().run()}
        className="italic"
      >
        Italic
      </Tool>
      <Tool
        label="Link"
        hint="Link the selected text"
        keys={SHORTCUTS.link}
        active={s.link}
        disabled={s.inTitle}
        onClick={onLink}
        className="underline decoration-kraft underline-offset-2"
      >
        Link
      </Tool>
      <Tool label="List" hint="Bulleted list" keys={SHORTCUTS.list} active={s.list} disabled={!s.canList} onClick={() => chain().toggleBulletList().run()}>
        • List
      </Tool>
      <Tool
        label="Numbered list"
        hint="Numbered list"
        keys={SHORTCUTS.numbered}
        active={s.numbered}
        disabled={!s.canNumbered}
        onClick={() => chain().toggleOrderedList().run()}
      >
        Numbered list
      </Tool>
      {status && <div className="ml-auto pl-3">{status}</div>}
    </div>
  );
}
