import { describe, expect, it } from 'vitest';
import { can, type Action } from './access';

// PRODUCT.md section 2: owner everything; designer creates/edits jobs, designs, clients; crew reads.
const table: [Action, owner: boolean, designer: boolean, crew: boolean][] = [
  ['job:read', true, true, true],
  ['job:write', true, true, false],
  ['job:delete', true, false, false],
  ['design:read', true, true, true],
  ['design:write', true, true, false],
  ['client:read', true, true, true],
  ['client:write', true, true, false],
  ['firm:read', true, true, true],
  ['catalogue:read', true, true, true],
  ['catalogue:write', true, false, false],
];

describe('role matrix', () => {
  it.each(table)('%s: owner %s, designer %s, crew %s', (action, owner, designer, crew) => {
    expect(can({ role: 'owner' }, action)).toBe(owner);
    expect(can({ role: 'designer' }, action)).toBe(designer);
    expect(can({ role: 'crew' }, action)).toBe(crew);
  });
  it('refuses everything to nobody', () => {
    expect(can(null, 'job:read')).toBe(false);
  });
});
