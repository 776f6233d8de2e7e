import type { ReactNode } from 'react';
import { ROLE_LABELS, type Role } from '@shared/roles';
import type { MeDto } from '@shared/schemas/auth.schema';
import { hasAbility, useCurrentUser } from '@/lib/auth';
import { PanelBoundary } from '@/components/ui/error-boundary';
import { FindHoseCard } from '@/features/overview/components/find-hose-card';
import { RegisterHealthCard } from '@/features/overview/components/register-health-card';
import { UnitsCard } from '@/features/preferences/components/units-card';
import { MySitesCard } from '@/features/sites/components/my-sites-card';
import { UsersSummaryCard } from '@/features/users/components/users-summary-card';
import { PageHeader } from './page-header';

interface HomeCard {
  id: string;
  /** Named in the message if the card fails. */
  title: string;
  render: (user: MeDto) => ReactNode;
  /** Shown only when the server granted this; the role alone never decides. */
  visible?: (user: MeDto) => boolean;
}

const CARDS = {
  users: {
    id: 'users',
    title: 'The users summary could not be shown',
    render: () => <UsersSummaryCard />,
    visible: (user) => hasAbility(user, 'users.list'),
  },
  sites: { id: 'sites', title: 'Your sites could not be shown', render: (user) => <MySitesCard user={user} /> },
  units: { id: 'units', title: 'Your units could not be shown', render: (user) => <UnitsCard preferences={user.preferences} /> },
  find: { id: 'find', title: 'The way to find a hose could not be shown', render: () => <FindHoseCard />, visible: (user) => hasAbility(user, 'register.read') },
  fieldWork: {
    id: 'field-work',
    title: 'The hoses that need you could not be shown',
    render: () => <RegisterHealthCard variant="field" />,
    visible: (user) => hasAbility(user, 'register.read'),
  },
  register: {
    id: 'register',
    title: 'The register summary could not be shown',
    render: () => <RegisterHealthCard variant="engineer" />,
    visible: (user) => hasAbility(user, 'register.read'),
  },
} satisfies Record<string, HomeCard>;

/** Each role's home is its own list of cards, in the order that role needs them. */
const HOME_CARDS: Record<Role, HomeCard[]> = {
  technician: [CARDS.find, CARDS.fieldWork, CARDS.sites, CARDS.units],
  reliability_engineer: [CARDS.register, CARDS.fieldWork, CARDS.sites, CARDS.units],
  safety_officer: [CARDS.fieldWork, CARDS.register, CARDS.sites, CARDS.units],
  administrator: [CARDS.users, CARDS.register, CARDS.sites, CARDS.units],
  viewer: [CARDS.register, CARDS.sites, CARDS.units],
};

export function homeTitle(role: Role): string {
  return `${ROLE_LABELS[role]} home`;
}

export function HomePage() {
  const user = useCurrentUser();
  const cards = HOME_CARDS[user.role].filter((card) => !card.visible || card.visible(user));

  return (
    <>
      <PageHeader title={homeTitle(user.role)} description={`Signed in as ${user.name}.`} />
      <div className="grid grid-cols-1 gap-5 lg:grid-cols-2">
        {cards.map((card) => (
          <PanelBoundary key={card.id} title={card.title}>
            {card.render(user)}
          </PanelBoundary>
        ))}
      </div>
    </>
  );
}
