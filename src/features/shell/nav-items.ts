import type { IconName } from '@/components/ui';
import type { Role } from '@/features/auth/types';

export type NavItem = {
  label: string;
  href: '/' | '/parts' | '/heatsinks' | '/interface-materials' | '/team' | '/outbox' | '/activity' | '/account';
  icon: IconName;
  /** Whether the item is the current section for this pathname. */
  matches: (pathname: string) => boolean;
  /** Shown only to owners of the current team. */
  ownerOnly?: boolean;
  /** The phone's tab bar has less room: another label and section, or no tab (false). */
  phone?: false | { label: string; matches: (pathname: string) => boolean };
};

const isCatalogue = (pathname: string) => pathname.startsWith('/heatsinks') || pathname.startsWith('/interface-materials');

/** Sections of the workspace. Only screens that exist are listed. */
export const NAV_ITEMS: readonly NavItem[] = [
  {
    label: 'Studies',
    href: '/',
    icon: 'studies',
    matches: (pathname) => pathname === '/' || pathname.startsWith('/studies'),
  },
  {
    label: 'Parts',
    href: '/parts',
    icon: 'part',
    matches: (pathname) => pathname.startsWith('/parts'),
  },
  {
    label: 'Heatsinks',
    href: '/heatsinks',
    icon: 'heatsink',
    matches: (pathname) => pathname.startsWith('/heatsinks'),
    // One tab for both catalogues; their screens switch between them.
    phone: { label: 'Library', matches: isCatalogue },
  },
  {
    label: 'Interfaces',
    href: '/interface-materials',
    icon: 'interface',
    matches: (pathname) => pathname.startsWith('/interface-materials'),
    phone: false,
  },
  {
    label: 'Team',
    href: '/team',
    icon: 'team',
    matches: (pathname) => pathname.startsWith('/team'),
  },
  {
    label: 'Outbox',
    href: '/outbox',
    icon: 'outbox',
    matches: (pathname) => pathname.startsWith('/outbox'),
    ownerOnly: true,
  },
  {
    label: 'Activity',
    href: '/activity',
    icon: 'activity',
    matches: (pathname) => pathname.startsWith('/activity'),
    ownerOnly: true,
  },
  {
    label: 'Account',
    href: '/account',
    icon: 'account',
    matches: (pathname) => pathname.startsWith('/account'),
  },
];

/** The sections a member with this role in the current team sees. */
export function navItemsFor(role: Role | undefined): NavItem[] {
  return NAV_ITEMS.filter((item) => !item.ownerOnly || role === 'owner');
}

/** The tabs of the phone layout for this role, with their phone labels. */
export function phoneNavItemsFor(role: Role | undefined): NavItem[] {
  return navItemsFor(role).flatMap((item) => (item.phone === false ? [] : item.phone ? [{ ...item, ...item.phone }] : [item]));
}
