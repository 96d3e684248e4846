// Support tool: drag across the joists to lay a new support row.
import type { ToolDef } from '../types';
import { creatingState } from './Creating';
import { idleState } from './Idle';

export const supportTool: ToolDef = {
  id: 'support',
  initial: 'idle',
  states: [idleState, creatingState],
};
