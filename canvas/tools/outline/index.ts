// Outline tool: tap corners (or type side lengths) to draw a new deck edge, tap the first corner to close.
import { panningState } from '../shared/Panning';
import type { ToolDef } from '../types';
import { idleState } from './Idle';
import { pointingState } from './Pointing';

export const outlineTool: ToolDef = {
  id: 'outline',
  initial: 'idle',
  states: [idleState, pointingState, panningState],
};
