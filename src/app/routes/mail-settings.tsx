import { useParams } from 'react-router-dom';
import { useMe } from '@/features/auth/api/get-me';
import { MailSettingsForm } from '@/features/mail-settings/components/mail-settings-form';

/** The signed-in person's e-mail choices for one studio. */
export function MailSettingsRoute() {
  const { studioId = '' } = useParams();
  const me = useMe();
  const studio = me.data?.studios.find((s) => s.id === studioId);
  return (
    <main className="mx-auto max-w-2xl px-4 py-8 sm:px-6">
      <h1 className="mb-4 text-2xl">E-mail settings</h1>
      <MailSettingsForm studioId={studioId} studioName={studio?.name ?? 'this studio'} />
      {me.data && me.data.studios.length > 1 && (
        <p className="mt-4 text-sm text-pencil">These choices are for this studio only: each of your studios has its own.</p>
      )}
    </main>
  );
}
