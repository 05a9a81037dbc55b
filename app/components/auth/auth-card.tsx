import type { ReactNode } from "react";

/** The narrow centred card the account pages (sign in, sign up, password reset) share. */
export function AuthCard({
  title,
  intro,
  children,
  aside,
}: {
  title: string;
  intro?: ReactNode;
  children: ReactNode;
  aside?: ReactNode;
}) {
  return (
    <div className="mx-auto grid max-w-4xl gap-8 py-4 sm:py-10 md:grid-cols-[minmax(0,28rem)_minmax(0,1fr)] md:items-start">
      <section className="rounded-xl border border-sand-200 bg-white p-6 shadow-sm sm:p-8">
        <h1 className="text-2xl font-semibold tracking-tight">{title}</h1>
        {intro ? <div className="mt-2 text-sm text-ink-700">{intro}</div> : null}
        <div className="mt-6">{children}</div>
      </section>
      {aside ? <aside className="space-y-4">{aside}</aside> : null}
    </div>
  );
}
