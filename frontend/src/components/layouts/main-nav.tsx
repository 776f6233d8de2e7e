import type { ComponentType, SVGProps } from 'react';
import type { MeDto } from '@shared/schemas/auth.schema';
import type { Action } from '@shared/permissions';
import { paths } from '@/config/paths';
import { hasAbility } from '@/lib/auth';
import { HomeIcon, SlidersIcon, UsersIcon } from '@/components/ui/icons';

export interface NavItem {
  label: string;
  /** Fits under an icon in the phone's bottom bar. */
  shortLabel: string;
  to: string;
  icon: ComponentType<SVGProps<SVGSVGElement>>;
  /** The ability the server must have granted for the item to show. */
  ability?: Action;
  end?: boolean;
}

export const NAV_ITEMS: NavItem[] = [
  { label: 'Home', shortLabel: 'Home', to: paths.home.getHref(), icon: HomeIcon, end: true },
  { label: 'Users', shortLabel: 'Users', to: paths.users.list.getHref(), icon: UsersIcon, ability: 'users.list' },
  { label: 'Preferences', shortLabel: 'Preferences', to: paths.preferences.getHref(), icon: SlidersIcon },
];

/** The navigation items this user's abilities open. */
export function navItemsFor(user: Pick<MeDto, 'abilities'>): NavItem[] {
  return NAV_ITEMS.filter((item) => !item.ability || hasAbility(user, item.ability));
}
