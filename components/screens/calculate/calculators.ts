import { type Href } from 'expo-router';

/** One calculator: its name, the question it answers, and where it lives once it runs in this build. */
export type CalculatorSpec = { key: string; name: string; description: string; href?: Href };

/** The calculators Ligandry plans, in the order a bath chemist tends to reach for them. */
export const CALCULATORS: readonly CalculatorSpec[] = [
  {
    key: 'headroom',
    name: 'Headroom',
    description:
      'How much more metal salt a bath will dissolve before a solid persists, such as how much more silver cyanide a plating bath can carry.',
    href: '/calculate/headroom',
  },
  {
    key: 'fixer-loading',
    name: 'Fixer loading',
    description: 'How much silver a thiosulfate fixer holds, how much more silver halide it can take, and how loaded it is.',
    href: '/calculate/fixer-loading',
  },
  {
    key: 'speciation',
    name: 'Speciation',
    description:
      'Where the metal and ligand sit at equilibrium: each complex, its share of the metal, and which solids are present or close to forming, from the reviewed constants in the library.',
    href: '/calculate/speciation',
  },
  {
    key: 'curves',
    name: 'Curves',
    description: 'Sweep one input across a range and chart solubility and species along the way, with the data as CSV.',
    href: '/calculate/curves',
  },
  {
    key: 'precipitation-order',
    name: 'Precipitation order',
    description: 'Which metal comes out of solution first as a precipitant is dosed into a mixed bath.',
    href: '/calculate/precipitation-order',
  },
  {
    key: 'dosing-plan',
    name: 'Dosing plan',
    description: 'A sequence of additions, with the state of the solution after each step.',
    href: '/calculate/dosing-plan',
  },
  {
    key: 'make-up',
    name: 'Make-up',
    description: 'How much salt to add to reach a target free-ligand level or a target headroom.',
    href: '/calculate/make-up',
  },
];
