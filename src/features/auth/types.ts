export type Role = 'owner' | 'designer' | 'reviewer';

export type User = { id: number; email: string; name: string };

export type Membership = { teamId: number; teamName: string; role: Role };

/** Body of `GET/POST /api/session` and `POST /api/accounts`. */
export type Session = { user: User; memberships: Membership[] };
