import { useEffect, useId, useRef, type ReactNode } from 'react';
import { Button } from './button';

/** A modal question on the native <dialog> (focus trap and Escape come with it). */
export function ConfirmDialog(props: {
  open: boolean;
  title: string;
  children?: ReactNode;
  confirmLabel: string;
  danger?: boolean;
  busy?: boolean;
  onConfirm: () => void;
  onCancel: () => void;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (props.open && !d.open) d.showModal();
    if (!props.open && d.open) d.close();
  }, [props.open]);
  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      onCancel={props.onCancel}
      className="m-auto w-full max-w-md rounded-lg border border-line bg-paper p-6 text-ink backdrop:bg-ink/30"
    >
      <h2 id={titleId} className="text-lg">
        {props.title}
      </h2>
      {props.children && <div className="mt-2 text-sm text-pencil">{props.children}</div>}
      <div className="mt-6 flex justify-end gap-2">
        <Button variant="secondary" onClick={props.onCancel}>
          Cancel
        </Button>
        <Button variant={props.danger ? 'danger' : 'primary'} busy={props.busy} onClick={props.onConfirm}>
          {props.confirmLabel}
        </Button>
      </div>
    </dialog>
  );
}
