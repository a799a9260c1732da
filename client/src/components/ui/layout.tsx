import { useId, type ReactNode } from 'react';

// Every screen has one h1 naming it; sections below use h2.
export function PageHeading({ title, lead, actions }: { title: string; lead?: ReactNode; actions?: ReactNode }) {
  return (
    <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
      <div className="min-w-0">
        <h1 className="text-3xl font-bold">{title}</h1>
        {lead ? <p className="mt-1 text-muted">{lead}</p> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-tap-gap">{actions}</div> : null}
    </div>
  );
}

export function Section({ title, children, id }: { title: string; children: ReactNode; id?: string }) {
  const headingId = id ? `${id}-heading` : undefined;
  return (
    <section aria-labelledby={headingId} className="mb-8 min-w-0" data-testid={id}>
      <h2 id={headingId} className="mb-3 text-2xl font-bold">
        {title}
      </h2>
      {children}
    </section>
  );
}

// A framed part of a screen named by its own heading: h2 on its own, h3 inside a Section; dashed when it
// stands aside from the screen's work (the demo accounts).
export function Panel({
  title,
  level = 2,
  aside = false,
  className = '',
  children,
  'data-testid': testId,
}: {
  title: ReactNode;
  level?: 2 | 3;
  aside?: boolean;
  className?: string;
  children: ReactNode;
  'data-testid'?: string;
}) {
  const headingId = useId();
  const Frame = aside ? 'aside' : 'section';
  const Heading = level === 2 ? 'h2' : 'h3';
  return (
    <Frame
      aria-labelledby={headingId}
      className={`rounded-xl border-2 border-line p-4 ${aside ? 'border-dashed' : 'bg-surface'} ${className}`}
      data-testid={testId}
    >
      <Heading id={headingId} className="text-xl font-bold">
        {title}
      </Heading>
      {children}
    </Frame>
  );
}

export function Card({ children, className = '' }: { children: ReactNode; className?: string }) {
  return <div className={`rounded-xl border-2 border-line bg-surface p-4 ${className}`}>{children}</div>;
}

export function Stack({ children, className = '' }: { children: ReactNode; className?: string }) {
  return <div className={`flex flex-col gap-tap-gap ${className}`}>{children}</div>;
}

export function EmptyState({ title, children }: { title: string; children?: ReactNode }) {
  return (
    <div className="rounded-xl border-2 border-dashed border-line p-6" data-testid="empty-state">
      <p className="text-xl font-bold">{title}</p>
      {children ? <div className="mt-2 text-muted">{children}</div> : null}
    </div>
  );
}
