import type { IconName } from '@/components/ui';

export type NavItem = {
  label: string;
  href: '/' | '/account';
  icon: IconName;
  /** Whether the item is the current section for this pathname. */
  matches: (pathname: string) => boolean;
};

/** Sections of the workspace. Only screens that exist are listed. */
export const NAV_ITEMS: readonly NavItem[] = [
  {
    label: 'Studies',
    href: '/',
    icon: 'studies',
    matches: (pathname) => pathname === '/' || pathname.startsWith('/studies'),
  },
  {
    label: 'Account',
    href: '/account',
    icon: 'account',
    matches: (pathname) => pathname.startsWith('/account'),
  },
];
