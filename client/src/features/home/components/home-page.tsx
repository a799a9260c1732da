import type { ReactNode } from 'react';
import type { Role } from '@yardcall/shared';
import { PageHeading } from '@/components/ui/layout';

// Every home: an h1 naming it and a stable test id per role.
export function HomePage({
  role,
  title,
  lead,
  children,
}: {
  role: Role;
  title: string;
  lead?: ReactNode;
  children: ReactNode;
}) {
  return (
    <div data-testid={`home-${role}`}>
      <PageHeading title={title} lead={lead} />
      {children}
    </div>
  );
}
