import type { Role } from '../../shared/account/roles.ts';

/**
 * The demo: Alder Street Makerspace, an invented community workshop that runs a
 * "build your own camp stove" evening. Passwords are public on purpose; demo seeding is
 * off in production unless SEED_DEMO=true.
 */
export interface DemoAccount {
  name: string;
  email: string;
  password: string;
  role: Role;
  /** Gets the demo designs in its library when the account is first made. */
  withDemoLibrary?: boolean;
  /** Runs the demo workshop, with the demo-library account as a member. */
  runsDemoWorkshop?: boolean;
}

export const demoAccounts: DemoAccount[] = [
  { name: 'Robin Maker', email: 'maker@alder-street.example', password: 'demo-maker-stove', role: 'maker', withDemoLibrary: true },
  { name: 'Jo Instructor', email: 'instructor@alder-street.example', password: 'demo-instructor-stove', role: 'instructor', runsDemoWorkshop: true },
  { name: 'Sam Admin', email: 'admin@alder-street.example', password: 'demo-admin-stove', role: 'admin' },
];
