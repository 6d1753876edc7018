import { useParams, useSearchParams } from 'react-router-dom';
import { Notice } from '@/components/ui/notice';
import { Loading } from '@/components/ui/spinner';
import { usePublicClass } from '@/features/classes/api/public-class';
import { ClassFacts } from '@/features/classes/components/class-facts';
import { RegisterForm } from '@/features/classes/components/register-form';
import { RegistrationView } from '@/features/classes/components/registration-view';

/** Goes to the payment provider's hosted checkout. */
const toCheckout = (url: string) => window.location.assign(url);

function Frame({ children, studio }: { children: React.ReactNode; studio?: string }) {
  return (
    <div className="min-h-screen">
      <header className="border-b border-line bg-white/80">
        <div className="mx-auto flex max-w-3xl items-center gap-3 px-4 py-3">
          <span className="font-serif text-lg font-bold">Cardwright</span>
          {studio && <span className="text-sm text-pencil">{studio}</span>}
        </div>
      </header>
      <main className="mx-auto max-w-3xl px-4 py-8">{children}</main>
    </div>
  );
}

/** The public page of a class at /c/:studioSlug/:classId: readable and open to register without an account. */
export function PublicClassRoute() {
  const { studioSlug = '', classId = '' } = useParams();
  const q = usePublicClass(studioSlug, classId);
  if (q.isPending)
    return (
      <Frame>
        <Loading label="Loading the class" />
      </Frame>
    );
  if (q.error)
    return (
      <Frame>
        <Notice kind="error">{q.error.message}</Notice>
      </Frame>
    );
  const k = q.data;
  return (
    <Frame studio={k.studio.name}>
      <h1 className="text-3xl">{k.title}</h1>
      <p className="mt-1 text-sm text-pencil">
        A class with {k.studio.name}, from the tutorial “{k.tutorial.title}”
        {k.tutorial.publicUrl && (
          <>
            {' '}
            (
            <a className="underline" href={k.tutorial.publicUrl}>
              read it
            </a>
            )
          </>
        )}
      </p>
      <hr className="score-rule my-4" />
      <ClassFacts k={k} />
      <section aria-label="Register" className="mt-6 rounded-lg border border-line bg-white p-4">
        <h2 className="mb-3 text-xl">Register</h2>
        <RegisterForm k={k} onCheckout={toCheckout} />
      </section>
    </Frame>
  );
}

/** The attendee's own page: /c/:studioSlug/:classId/r/:registrationId?token=… (the payment provider returns here). */
export function RegistrationRoute() {
  const { registrationId = '' } = useParams();
  const [search] = useSearchParams();
  return (
    <Frame>
      <RegistrationView id={registrationId} token={search.get('token') ?? ''} returned={search.get('checkout')} onCheckout={toCheckout} />
    </Frame>
  );
}
