import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { Wordmark } from '../../components/ui';

/** A small decorative trace: an input stage drawn as a signal path, ending in the copper accent. */
function SignalPath() {
  return (
    <svg aria-hidden="true" viewBox="0 0 320 120" className="w-full max-w-sm text-paper/25">
      <g fill="none" stroke="currentColor" strokeWidth="1.5" strokeLinecap="round" strokeLinejoin="round">
        <path d="M8 60h40" />
        <path d="M48 48v24M56 48v24" />
        <path d="M56 60h26l6-10 8 20 8-20 8 20 8-20 6 10h20" />
        <path d="M144 60v22M136 82h16M139 87h10M142 92h4" />
        <path d="M144 60h28" />
        <path d="M172 36v48l40-24z" />
        <path d="M212 60h30" />
        <path d="M186 36V24h40v36" strokeDasharray="3 4" />
      </g>
      <path d="M242 60c10 0 12-22 22-22s12 44 22 44 12-22 26-22" fill="none" strokeWidth="2.5" strokeLinecap="round" className="stroke-copper-bright" />
    </svg>
  );
}

export function AuthFrame({ title, subtitle, children }: { title: ReactNode; subtitle?: ReactNode; children: ReactNode }) {
  return (
    <div className="grid min-h-dvh bg-paper lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
      <aside className="relative hidden flex-col justify-between overflow-hidden bg-ink p-10 text-paper lg:flex">
        <Link to="/" aria-label="Understudy home" className="self-start rounded-md">
          <Wordmark inverted />
        </Link>
        <div className="flex flex-col gap-6">
          <SignalPath />
          <p className="max-w-sm text-2xl leading-snug font-semibold">
            Every part deserves a stand-in that sounds the same.
          </p>
          <p className="max-w-sm text-sm text-paper/70">
            Understudy keeps your parts, datasheets and approved substitutions in one place, so a shortage never stops a build.
          </p>
        </div>
        <p className="text-xs text-paper/50">For pedal designers, purchasers and part librarians.</p>
      </aside>
      <main id="main" className="flex items-center justify-center px-4 py-10 sm:px-8">
        <div className="w-full max-w-md">
          <Link to="/" aria-label="Understudy home" className="mb-8 inline-block rounded-md lg:hidden">
            <Wordmark />
          </Link>
          <h1 className="text-2xl font-bold tracking-tight text-ink">{title}</h1>
          {subtitle && <p className="mt-1.5 text-sm text-ink-soft">{subtitle}</p>}
          <div className="mt-6">{children}</div>
        </div>
      </main>
    </div>
  );
}
