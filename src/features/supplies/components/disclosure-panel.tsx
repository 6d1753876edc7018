import { useEffect, useId, useRef, useState } from 'react';
import { disclosureSchema, type DisclosureDto } from '@shared/schemas/supply';
import { Button } from '@/components/ui/button';
import { useUpdateDisclosure } from '../api/update-disclosure';

/**
 * The sponsorship disclosure. While any shop link is sponsored it shows the wording that goes out
 * with the supplies, which the maker may rewrite or return to the default; otherwise a quiet note
 * says one will be needed.
 */
export function DisclosurePanel({ tutorialId, disclosure, canEdit }: { tutorialId: string; disclosure: DisclosureDto; canEdit: boolean }) {
  if (!disclosure.required) {
    return (
      <p className="text-sm text-pencil">
        No shop link is marked sponsored, so no disclosure is needed. Mark a sponsored or affiliate link and a disclosure will be needed: its wording appears
        here, and it goes out with the supplies in the write-up and in every export.
      </p>
    );
  }
  return (
    <section aria-labelledby="disclosure-title" className="rounded-lg border border-kraft/40 bg-white p-4">
      <h3 id="disclosure-title" className="text-base">
        Sponsorship disclosure
      </h3>
      <p className="mt-1 text-sm text-pencil">
        At least one shop link is sponsored, so this note appears with the supplies in the write-up and in the exports (blog post, handout, video description).
      </p>
      {canEdit ? (
        <DisclosureEditor tutorialId={tutorialId} disclosure={disclosure} />
      ) : (
        <blockquote className="mt-3 border-l-2 border-kraft/50 pl-3 text-sm">{disclosure.text}</blockquote>
      )}
    </section>
  );
}

function DisclosureEditor({ tutorialId, disclosure }: { tutorialId: string; disclosure: DisclosureDto }) {
  const id = useId();
  const save = useUpdateDisclosure(tutorialId);
  const [text, setText] = useState(disclosure.text);
  const [error, setError] = useState<string | null>(null);
  const [status, setStatus] = useState<string | null>(null);
  const dirty = text.trim() !== disclosure.text.trim();
  // What the server last sent replaces the text only while the person has nothing unsaved in it.
  const lastServer = useRef(disclosure.text);
  useEffect(() => {
    if (disclosure.text !== lastServer.current) {
      setText((t) => (t.trim() === lastServer.current.trim() ? disclosure.text : t));
      lastServer.current = disclosure.text;
    }
  }, [disclosure.text]);
  useEffect(() => {
    if (!status) return;
    const t = setTimeout(() => setStatus(null), 4000);
    return () => clearTimeout(t);
  }, [status]);

  const send = async (value: string | null, done: string) => {
    setError(null);
    setStatus(null);
    try {
      const d = await save.mutateAsync(value);
      lastServer.current = d.text;
      setText(d.text);
      setStatus(done);
    } catch (e) {
      setError((e as Error).message);
    }
  };
  const onSave = () => {
    const r = disclosureSchema.safeParse({ disclosure: text });
    if (!r.success) return setError(r.error.issues[0]?.message ?? 'This wording cannot be saved');
    const wording = r.data.disclosure;
    // An empty box means "no wording of my own": the default is used.
    void send(wording ? wording : null, wording ? 'Saved your wording.' : 'Using the default wording.');
  };

  return (
    <div className="mt-3 space-y-2">
      <div className="flex items-baseline justify-between">
        <label htmlFor={id} className="text-sm font-medium">
          Disclosure wording
        </label>
        <span className="text-xs text-pencil">{disclosure.custom ? 'Your own wording' : 'The default wording'}</span>
      </div>
      <textarea
        id={id}
        rows={3}
        value={text}
        maxLength={1000}
        onChange={(e) => setText(e.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={`w-full resize-y rounded-md border bg-white px-3 py-2 text-sm focus:border-kraft ${error ? 'border-rosehip' : 'border-field'}`}
      />
      {error && (
        <p id={`${id}-error`} role="alert" className="text-xs text-rosehip">
          {error}
        </p>
      )}
      <div className="flex flex-wrap items-center gap-2">
        <Button size="sm" onClick={onSave} disabled={!dirty} busy={save.isPending && save.variables !== null}>
          Save
        </Button>
        {disclosure.custom && (
          <Button size="sm" variant="secondary" onClick={() => void send(null, 'Using the default wording.')} busy={save.isPending && save.variables === null}>
            Use the default wording
          </Button>
        )}
        {dirty && !save.isPending && (
          <Button size="sm" variant="ghost" onClick={() => (setText(disclosure.text), setError(null))}>
            Discard changes
          </Button>
        )}
        <span role="status" className="text-sm text-sage">
          {status}
        </span>
      </div>
    </div>
  );
}
