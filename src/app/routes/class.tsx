import { useParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useClass } from '@/features/classes/api/get-class';
import { ClassSettings } from '@/features/classes/components/class-settings';
import { KitPlanner } from '@/features/classes/components/kit-planner';
import { MessageForm } from '@/features/classes/components/message-form';
import { Roster } from '@/features/classes/components/roster';

/** One class: its public address, the roster, the kit planner, messages, details and cautions. */
export function ClassRoute() {
  const { classId = '' } = useParams();
  const q = useClass(classId);
  if (q.isPending) return <Loading label="Loading the class" />;
  if (q.error) return <Notice kind="error">{q.error.message}</Notice>;
  const k = q.data;
  return (
    <main className="mx-auto flex max-w-5xl flex-col gap-5 px-4 py-8 sm:px-6">
      <header>
        <h1 className="text-2xl">{k.title}</h1>
        <p className="mt-1 text-sm">
          {k.when} · {k.place} · {k.fee}
        </p>
        {k.status === 'cancelled' && (
          <div className="mt-2">
            <Notice kind="error">This class is cancelled.</Notice>
          </div>
        )}
        <p className="mt-2 text-sm">
          Public page:{' '}
          <a className="break-all text-kraft-dark underline" href={k.publicPath} target="_blank" rel="noreferrer">
            {k.publicUrl}
          </a>
          {' · '}
          <a className="text-kraft-dark underline" href={paths.classHandoutPdf(k.id, k.paper)} download>
            Class handout (PDF)
          </a>
        </p>
        <hr className="score-rule mt-4" />
      </header>
      <Roster klass={k} csvHref={paths.rosterCsv(k.id)} />
      <KitPlanner classId={k.id} pdfHref={(paper) => paths.kitsPdf(k.id, paper)} />
      <MessageForm classId={k.id} />
      <ClassSettings key={k.cautions.join('|')} klass={k} />
    </main>
  );
}
