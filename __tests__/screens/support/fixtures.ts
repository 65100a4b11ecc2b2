import type { Role, Session } from '@/features/auth/types';
import type { StudySummary } from '@/features/studies/types';

/** Invented test data shaped like the API contract (`GET /api/session`, `GET /api/studies`). */
export function sessionFor(role: Role): Session {
  return {
    user: { id: 7, email: `${role}@example.com`, name: `Test ${role}` },
    memberships: [{ teamId: 1, teamName: 'Test Lab', role }],
  };
}

export const STUDIES: StudySummary[] = [
  {
    id: 11,
    teamId: 1,
    teamName: 'Test Lab',
    title: 'Shunt regulator on a TO-220 clip sink',
    description: 'Steady 0.4 A through a 12 V shunt stage.',
    status: 'draft',
    version: 1,
    author: { id: 7, name: 'Bea Designer' },
    createdAt: '2025-03-01T09:00:00.000Z',
    updatedAt: '2025-03-02T09:00:00.000Z',
  },
  {
    id: 12,
    teamId: 1,
    teamName: 'Test Lab',
    title: 'Audio output pair, class AB idle',
    description: 'Quiescent dissipation of two bipolar devices.',
    status: 'approved',
    version: 3,
    author: { id: 8, name: 'Al Owner' },
    createdAt: '2025-02-01T09:00:00.000Z',
    updatedAt: '2025-04-10T09:00:00.000Z',
  },
  {
    id: 13,
    teamId: 1,
    teamName: 'Test Lab',
    title: 'Current sink for battery discharge tests',
    description: '',
    status: 'in_review',
    version: 2,
    author: { id: 7, name: 'Bea Designer' },
    createdAt: '2025-01-05T09:00:00.000Z',
    updatedAt: '2025-01-06T09:00:00.000Z',
  },
];
