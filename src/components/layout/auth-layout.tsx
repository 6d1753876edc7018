import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';

/** The centred card for sign-in, sign-up, reset and invitation pages. */
export function AuthLayout({ title, children, aside }: { title: string; children: ReactNode; aside?: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col items-center justify-center gap-6 px-4 py-12">
      <Link to={paths.home()} className="font-serif text-2xl font-bold tracking-tight text-ink">
        Cardwright
      </Link>
      <main className="w-full max-w-md rounded-xl border border-line bg-white p-5 shadow-sm sm:p-8">
        <h1 className="text-xl">{title}</h1>
        <hr className="score-rule my-4" />
        {children}
      </main>
      {aside}
    </div>
  );
}
