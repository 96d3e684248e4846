// The invented demo firm's people, offered as one-tap sign-ins on demo installs.
import type { Role } from '@/components/layout/roles';

export const DEMO_FIRM = 'Larchfield Decks';
export const DEMO_PASSWORD = 'deckdemo-2026';

export const demoAccounts: { role: Role; name: string; email: string; blurb: string }[] = [
  {
    role: 'owner',
    name: 'Harriet Vane',
    email: 'owner@larchfield.example',
    blurb: 'Runs the firm: team, catalogue, every job',
  },
  {
    role: 'designer',
    name: 'Tom Ashby',
    email: 'designer@larchfield.example',
    blurb: 'Surveys, designs and prices jobs',
  },
  {
    role: 'crew',
    name: 'Priya Nandi',
    email: 'crew@larchfield.example',
    blurb: 'Builds from the plans; reads jobs',
  },
];

/** Demo sign-ins show unless JW_SHOW_DEMO is set to something other than "1" (it is a demo product). */
export function showDemoAccounts(env: Record<string, string | undefined> = process.env): boolean {
  const flag = env.JW_SHOW_DEMO;
  if (flag === undefined || flag === '') return true;
  return flag === '1' || flag.toLowerCase() === 'true';
}
