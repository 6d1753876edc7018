import { useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { paths } from '@/config/paths';
import { useClasses } from '@/features/classes/api/get-classes';
import { ClassList } from '@/features/classes/components/class-list';
import { ScheduleClassForm } from '@/features/classes/components/schedule-class-form';
import { useTutorials } from '@/features/tutorials/api/get-tutorials';

/** The studio's classes and a form to schedule one from a tutorial. */
export function ClassesRoute() {
  const { studioId = '' } = useParams();
  const navigate = useNavigate();
  const [search] = useSearchParams();
  const list = useClasses(studioId);
  const tutorials = useTutorials(studioId, {});
  const options = (tutorials.data?.tutorials ?? []).filter((t) => t.abilities.scheduleClass).map((t) => ({ id: t.id, title: t.title }));
  return (
    <main className="mx-auto max-w-5xl px-4 py-8 sm:px-6">
      <h1 className="text-2xl">Classes</h1>
      <hr className="score-rule my-4" />
      {list.data?.abilities.schedule && (
        <div className="mb-6 rounded-lg border border-line bg-white p-4">
          <h2 className="mb-3 text-lg">Schedule a class</h2>
          {options.length ? (
            <ScheduleClassForm
              studioId={studioId}
              tutorials={options}
              initialTutorialId={search.get('tutorial')}
              onCreated={(k) => navigate(paths.klass(k.id))}
            />
          ) : (
            <p className="text-sm text-pencil">A class is taught from a tutorial: start one on the Tutorials page first.</p>
          )}
        </div>
      )}
      {list.isPending ? (
        <Loading label="Loading classes" />
      ) : list.error ? (
        <Notice kind="error">{list.error.message}</Notice>
      ) : list.data.classes.length === 0 ? (
        <EmptyState title="No classes yet">Schedule one above: attendees then register on its public page, without an account.</EmptyState>
      ) : (
        <ClassList classes={list.data.classes} linkTo={paths.klass} />
      )}
    </main>
  );
}
