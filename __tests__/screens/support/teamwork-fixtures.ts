import type { Role, Session } from '@/features/auth/types';
import type { Review } from '@/features/review/types';
import type { RevisionSummary } from '@/features/revisions/types';
import type { Study } from '@/features/studies/types';
import type { Member } from '@/features/team/types';

/** Invented people of the test team, shaped like the API contract. */
export const PEOPLE = {
  owner: { id: 8, name: 'Al Owner', email: 'al@example.com' },
  designer: { id: 7, name: 'Bea Designer', email: 'bea@example.com' },
  reviewer: { id: 9, name: 'Cy Reviewer', email: 'cy@example.com' },
} as const;

/** A session of one of the people above, in team 1 with that person's role. */
export function sessionAs(role: Role): Session {
  const person = PEOPLE[role];
  return {
    user: { id: person.id, email: person.email, name: person.name },
    memberships: [{ teamId: 1, teamName: 'Test Lab', role }],
  };
}

export const MEMBERS: Member[] = (['owner', 'designer', 'reviewer'] as const).map((role, index) => ({
  userId: PEOPLE[role].id,
  name: PEOPLE[role].name,
  email: PEOPLE[role].email,
  role,
  since: `2025-01-0${index + 1}T09:00:00.000Z`,
}));

/** A study by the designer at `version`, with an empty document (the panels do not need one). */
export function studyAt(status: Study['status'], version: number, overrides: Partial<Study> = {}): Study {
  return {
    id: 21,
    teamId: 1,
    teamName: 'Test Lab',
    title: 'Linear post-regulator after a buck stage',
    description: 'Dropout 1.2 V at 3 A.',
    status,
    version,
    author: { id: PEOPLE.designer.id, name: PEOPLE.designer.name },
    createdAt: '2025-05-01T09:00:00.000Z',
    updatedAt: '2025-05-03T09:00:00.000Z',
    document: {},
    approval: null,
    ...overrides,
  };
}

/** Revisions newest first, each saved by `authors[number - 1]`. */
export function revisionsBy(authors: readonly { id: number; name: string }[]): RevisionSummary[] {
  return authors
    .map((author, index) => ({
      number: index + 1,
      title: 'Linear post-regulator after a buck stage',
      author: { id: author.id, name: author.name },
      createdAt: `2025-05-0${index + 1}T10:00:00.000Z`,
      changeCount: index === 0 ? 0 : 1,
      summary: index === 0 ? ['created'] : [`document.marginK: ${10 + index} → ${11 + index}`],
      reviews: [],
    }))
    .reverse();
}

export const NO_REVIEWS: Review[] = [];
