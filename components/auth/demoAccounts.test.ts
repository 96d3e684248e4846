import { describe, expect, it } from 'vitest';
import { showDemoAccounts } from './demoAccounts';

describe('showDemoAccounts', () => {
  it('shows the demo sign-ins by default', () => {
    expect(showDemoAccounts({})).toBe(true);
  });
  it('follows JW_SHOW_DEMO when it is set', () => {
    expect(showDemoAccounts({ JW_SHOW_DEMO: '1' })).toBe(true);
    expect(showDemoAccounts({ JW_SHOW_DEMO: '0' })).toBe(false);
    expect(showDemoAccounts({ JW_SHOW_DEMO: 'no' })).toBe(false);
  });
});
