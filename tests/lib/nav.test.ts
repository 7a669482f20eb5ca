import { isActive, navItemsFor } from '@/components/shell/nav';
import type { ServerInfo, Session } from '@/lib/api/types';
import type { Role } from '@/lib/roles';

const session = (role: Role): Session => ({
  user: { id: 1, name: 'A', email: 'a@b.test', role, unitSystem: 'metric', notifyReviews: true },
  organisation: {
    id: 1,
    name: 'B',
    abvLimitPercent: 0.5,
    warmestTempC: 35,
    ratingSharePercent: 80,
    lotPrefix: 'LOT',
    currency: 'USD',
    licensedForAlcohol: false,
  },
});
const info = (outbox: boolean, outboxOpen: boolean): ServerInfo => ({
  status: 'ok',
  db: 'ok',
  dialect: 'sqlite',
  storage: { kind: 'local', bucket: 'fizzwright-uploads' },
  version: '0',
  outbox,
  outboxOpen,
});

describe('navItemsFor', () => {
  it('shows Team only to owners, and Batches to every role', () => {
    expect(navItemsFor(session('owner'), info(false, false)).map((i) => i.label)).toEqual([
      'Home',
      'Recipes',
      'Batches',
      'Quick check',
      'Ingredients',
      'Bottles',
      'Team',
      'Profile',
    ]);
    expect(navItemsFor(session('brewer'), info(false, false)).map((i) => i.label)).toEqual([
      'Home',
      'Recipes',
      'Batches',
      'Quick check',
      'Ingredients',
      'Bottles',
      'Profile',
    ]);
    expect(navItemsFor(session('developer'), info(false, false)).map((i) => i.label)).toEqual([
      'Home',
      'Recipes',
      'Batches',
      'Quick check',
      'Ingredients',
      'Bottles',
      'Profile',
    ]);
  });

  it('shows the Mail outbox to owners when mail stays local, and to everyone when the outbox is open', () => {
    expect(navItemsFor(session('owner'), info(true, false)).map((i) => i.label)).toContain('Mail outbox');
    expect(navItemsFor(session('brewer'), info(true, false)).map((i) => i.label)).not.toContain('Mail outbox');
    expect(navItemsFor(session('brewer'), info(true, true)).map((i) => i.label)).toContain('Mail outbox');
  });
});

describe('isActive', () => {
  it('matches Home only on its own path and other items on their subpaths', () => {
    const [home, , , , , , team] = navItemsFor(session('owner'), undefined);
    expect(isActive(home, '/')).toBe(true);
    expect(isActive(home, '/team')).toBe(false);
    expect(isActive(team, '/team')).toBe(true);
    expect(isActive(team, '/team/5')).toBe(true);
    expect(isActive(team, '/teamwork')).toBe(false);
  });
});
