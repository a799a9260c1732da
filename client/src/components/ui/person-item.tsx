import type { ReactNode } from 'react';

// One person in a list of people: the name, the address, then what the list says of them.
export function PersonItem({
  person,
  className = '',
  children,
  'data-testid': testId,
}: {
  person: { name: string; email: string };
  className?: string;
  children: ReactNode;
  'data-testid'?: string;
}) {
  return (
    <li className={`rounded-xl border-2 border-line bg-surface p-4 ${className}`} data-testid={testId}>
      <p className="text-xl font-bold">{person.name}</p>
      <p className="text-muted">{person.email}</p>
      {children}
    </li>
  );
}
