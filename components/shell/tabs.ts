import { type ComponentType } from 'react';
import { type UseTabsWithTriggersOptions } from 'expo-router/ui';

import { BathIcon, BooksIcon, FlaskIcon, PersonIcon, ShieldIcon, type IconProps } from '@/components/shell/icons';

/** One top-level section of the app: its route, its words and its icon. */
export type TabSpec = {
  name: 'baths' | 'calculate' | 'library' | 'safety' | 'account';
  href: `/${string}`;
  label: string;
  hint: string;
  Icon: ComponentType<IconProps>;
};

/** The five sections in nav order; the shell, its triggers and the tests all read this list. */
export const TABS: readonly TabSpec[] = [
  { name: 'baths', href: '/baths', label: 'Baths', hint: 'Bath records', Icon: BathIcon },
  { name: 'calculate', href: '/calculate', label: 'Calculate', hint: 'Equilibrium calculators', Icon: FlaskIcon },
  { name: 'library', href: '/library', label: 'Library', hint: 'Constants library', Icon: BooksIcon },
  { name: 'safety', href: '/safety', label: 'Safety', hint: 'Safety desk and cautions', Icon: ShieldIcon },
  { name: 'account', href: '/account', label: 'Account', hint: 'Account and installation', Icon: PersonIcon },
];

/** Tab triggers in the form the headless tab navigator expects. */
export const TAB_TRIGGERS: UseTabsWithTriggersOptions['triggers'] = TABS.map((tab) => ({
  type: 'internal',
  name: tab.name,
  href: tab.href,
}));
