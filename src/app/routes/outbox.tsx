import { Link, useParams } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useOutbox, useOutboxMessage } from '@/features/outbox/api/outbox';

/** Mail caught by the local fake SMTP server; links inside can be followed directly. */
export function OutboxRoute() {
  const { messageId } = useParams();
  const list = useOutbox();
  return (
    <main className="mx-auto grid max-w-7xl grid-cols-[22rem_1fr] gap-6 px-6 py-8">
      <section>
        <h1 className="text-2xl">Outbox</h1>
        <p className="mt-1 text-sm text-pencil">Mail goes to a local stand-in while no real mail server is set, so it lands here instead of an inbox.</p>
        <hr className="score-rule my-4" />
        {list.isPending ? (
          <Loading />
        ) : list.error ? (
          <Notice kind="error">{list.error.message}</Notice>
        ) : list.data.messages.length === 0 ? (
          <EmptyState title="No mail yet">Invitations, password resets and review notices will appear here.</EmptyState>
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
      <section>{messageId ? <OutboxMessageView id={messageId} /> : <p className="mt-16 text-center text-sm text-pencil">Pick a message to read it.</p>}</section>
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
  if (q.isPending) return <Loading />;
  if (q.error) return <Notice kind="error">{q.error.message}</Notice>;
  const m = q.data.message;
  return (
    <article className="rounded-lg border border-line bg-white p-6">
      <h2 className="text-xl">{m.subject}</h2>
      <p className="mt-1 text-xs text-pencil">
        From {m.from} to {m.to} · {new Date(m.createdAt).toLocaleString()}
      </p>
      <hr className="score-rule my-4" />
      {/* The plain-text part, with links made clickable: no HTML from mail is rendered. */}
      <pre className="whitespace-pre-wrap font-sans text-sm">{linkify(m.text)}</pre>
      {m.attachments.length > 0 && (
        <p className="mt-4 text-xs text-pencil">Attachments: {m.attachments.map((a) => `${a.filename} (${Math.round(a.size / 1024)} KB)`).join(', ')}</p>
      )}
    </article>
  );
}
