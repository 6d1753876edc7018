import { Link, useNavigate, useParams } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useMe } from '@/features/auth/api/get-me';
import { useDeleteOutboxMessage, useOutbox, useOutboxMessage } from '@/features/outbox/api/outbox';

/** The signed-in person's own mail, caught by the local fake SMTP server; links inside can be followed directly. */
export function OutboxRoute() {
  const { messageId } = useParams();
  const list = useOutbox();
  const me = useMe();
  return (
    <main className="mx-auto grid max-w-7xl gap-6 px-4 py-8 sm:px-6 md:grid-cols-[22rem_1fr]">
      <section>
        <h1 className="text-2xl">Outbox</h1>
        <p className="mt-1 text-sm text-pencil">
          Mail to you{me.data ? ` (${me.data.user.email})` : ''} goes to a local stand-in while no real mail server is set, so it lands here instead of an
          inbox. Only messages addressed to you are listed.
        </p>
        {me.data?.devMailbox && (
          <p className="mt-2 text-sm">
            Mail to other addresses, such as an invitation to someone without an account yet, is in the{' '}
            <a href={paths.devMailbox()} className="text-kraft-dark underline">
              development mailbox
            </a>
            , which opens only on this computer.
          </p>
        )}
        <hr className="score-rule my-4" />
        {list.isPending ? (
          <Loading />
        ) : list.error ? (
          <Notice kind="error">{list.error.message}</Notice>
        ) : list.data.messages.length === 0 ? (
          <EmptyState title="No mail for you yet">Password resets, invitations and review notices sent to you will appear here.</EmptyState>
        ) : (
          <ul className="rounded-lg border border-line bg-white text-sm">
            {list.data.messages.map((m) => (
              <li key={m.id} className={`border-b border-line last:border-0 ${m.id === messageId ? 'bg-kraft-light' : ''}`}>
                <Link to={paths.outboxMessage(m.id)} className="block px-4 py-2">
                  <span className="block font-medium">{m.subject}</span>
                  <span className="block text-xs text-pencil">
                    to {m.to} · {new Date(m.createdAt).toLocaleString()}
                  </span>
                </Link>
              </li>
            ))}
          </ul>
        )}
      </section>
      <section>
        {messageId ? <OutboxMessageView id={messageId} /> : <p className="mt-16 text-center text-sm text-pencil">Pick a message to read it.</p>}
      </section>
    </main>
  );
}

const linkify = (text: string) =>
  text.split(/(https?:\/\/\S+)/g).map((part, i) =>
    /^https?:\/\//.test(part) ? (
      <a key={i} href={part} className="break-all text-kraft-dark underline">
        {part}
      </a>
    ) : (
      part
    ),
  );

function OutboxMessageView({ id }: { id: string }) {
  const q = useOutboxMessage(id);
  const remove = useDeleteOutboxMessage();
  const navigate = useNavigate();
  if (q.isPending) return <Loading />;
  if (q.error) return <Notice kind="error">{q.error.message}</Notice>;
  const m = q.data.message;
  return (
    <article className="min-w-0 rounded-lg border border-line bg-white p-4 sm:p-6">
      <div className="flex flex-wrap items-start justify-between gap-4">
        <h2 className="text-xl">{m.subject}</h2>
        <Button variant="danger" size="sm" busy={remove.isPending} onClick={() => remove.mutate(m.id, { onSuccess: () => void navigate(paths.outbox()) })}>
          Delete
        </Button>
      </div>
      <p className="mt-1 text-xs text-pencil">
        From {m.from} to {m.to} · {new Date(m.createdAt).toLocaleString()}
      </p>
      {remove.error && <Notice kind="error">{remove.error.message}</Notice>}
      <hr className="score-rule my-4" />
      {/* The plain-text part, with links made clickable: no HTML from mail is rendered. */}
      <pre className="whitespace-pre-wrap font-sans text-sm">{linkify(m.text)}</pre>
      {m.attachments.length > 0 && (
        <p className="mt-4 text-xs text-pencil">Attachments: {m.attachments.map((a) => `${a.filename} (${Math.round(a.size / 1024)} KB)`).join(', ')}</p>
      )}
    </article>
  );
}
