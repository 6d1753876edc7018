import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { useMessageAll } from '../api/class-mutations';

/** One e-mail to everyone with a seat. */
export function MessageForm({ classId }: { classId: string }) {
  const send = useMessageAll(classId);
  const [subject, setSubject] = useState('');
  const [body, setBody] = useState('');
  return (
    <form
      aria-label="Message all attendees"
      className="flex flex-col gap-2 rounded-lg border border-line bg-white p-4"
      onSubmit={(e) => {
        e.preventDefault();
        send.mutate({ subject, body }, { onSuccess: () => (setSubject(''), setBody('')) });
      }}
    >
      <h2 className="text-xl">Message all attendees</h2>
      <TextField label="Subject" value={subject} onChange={(e) => setSubject(e.target.value)} />
      <label className="flex flex-col gap-1 text-sm font-medium">
        Message
        <textarea
          className="min-h-24 rounded-md border border-line bg-white px-3 py-2 text-sm font-normal"
          value={body}
          onChange={(e) => setBody(e.target.value)}
        />
      </label>
      <div>
        <Button type="submit" busy={send.isPending} disabled={!subject.trim() || !body.trim()}>
          Send to everyone
        </Button>
      </div>
      {send.error && <Notice kind="error">{send.error.message}</Notice>}
      {send.data && <Notice kind="success">{send.data.message}</Notice>}
    </form>
  );
}
