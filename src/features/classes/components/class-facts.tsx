import type { PublicClassDto } from '@shared/schemas/class';

/** When, where, fee and what to bring, then the class's safety cautions. */
export function ClassFacts({ k }: { k: PublicClassDto }) {
  return (
    <>
      <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[8rem_1fr]">
        <dt className="text-pencil">When</dt>
        <dd>{k.when}</dd>
        <dt className="text-pencil">Where</dt>
        <dd className="break-words">
          {k.placeIsLink ? (
            <a className="text-kraft-dark underline" href={k.place}>
              {k.place}
            </a>
          ) : (
            k.place
          )}
        </dd>
        <dt className="text-pencil">Kit fee</dt>
        <dd>{k.fee}</dd>
        <dt className="text-pencil">Seats</dt>
        <dd>
          {k.seatsLeft} of {k.seats} left{k.waitlisted ? ` · ${k.waitlisted} on the waiting list` : ''}
        </dd>
        {k.whatToBring && (
          <>
            <dt className="text-pencil">What to bring</dt>
            <dd>{k.whatToBring}</dd>
          </>
        )}
      </dl>
      <section aria-label="Safety in the class" className="mt-5 rounded-md border border-rosehip/30 bg-white p-4">
        <h2 className="text-base text-rosehip">Safety in the class</h2>
        <ul className="mt-2 list-disc space-y-1 pl-5 text-sm">
          {k.cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </section>
    </>
  );
}
