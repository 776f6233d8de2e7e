import type { ComponentType, SVGProps } from 'react';
import type { MeDto } from '@shared/schemas/auth.schema';
import type { Action } from '@shared/permissions';
import { paths } from '@/config/paths';
import { hasAbility } from '@/lib/auth';
import { BookIcon, HomeIcon, ListIcon, MapIcon, SearchIcon, SlidersIcon, UploadIcon, UsersIcon } from '@/components/ui/icons';

export interface NavItem {
  label: string;
  /** Fits under an icon in the phone's bottom bar. */
  shortLabel: string;
  to: string;
  icon: ComponentType<SVGProps<SVGSVGElement>>;
  /** The ability the server must have granted for the item to show. */
  ability?: Action;
  end?: boolean;
  /** Shown in the phone's bottom bar; the others are under "More". */
  phone?: boolean;
  /** A path prefix whose pages all count as this item's, e.g. `/catalogue`. */
  section?: string;
}

export const NAV_ITEMS: NavItem[] = [
  { label: 'Home', shortLabel: 'Home', to: paths.home.getHref(), icon: HomeIcon, end: true, phone: true },
  { label: 'Find a hose', shortLabel: 'Find', to: paths.find.getHref(), icon: SearchIcon, ability: 'register.read', phone: true },
  { label: 'Register', shortLabel: 'Register', to: paths.register.getHref(), icon: ListIcon, ability: 'register.read', phone: true, section: '/assemblies' },
  { label: 'Catalogue', shortLabel: 'Catalogue', to: paths.catalogue.constructions.getHref(), icon: BookIcon, ability: 'register.read', section: '/catalogue' },
  { label: 'Sites and equipment', shortLabel: 'Sites', to: paths.catalogue.places.getHref(), icon: MapIcon, ability: 'register.read' },
  { label: 'Import', shortLabel: 'Import', to: paths.importCsv.getHref(), icon: UploadIcon, ability: 'imports.run' },
  { label: 'Users', shortLabel: 'Users', to: paths.users.list.getHref(), icon: UsersIcon, ability: 'users.list' },
  { label: 'Preferences', shortLabel: 'Preferences', to: paths.preferences.getHref(), icon: SlidersIcon },
];

/** The navigation items this user's abilities open. */
export function navItemsFor(user: Pick<MeDto, 'abilities'>): NavItem[] {
  return NAV_ITEMS.filter((item) => !item.ability || hasAbility(user, item.ability));
}
