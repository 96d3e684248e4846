// Select tool: tap to pick, drag corners and support rows, drag empty plan to pan.
import { panningState } from '../shared/Panning';
import type { ToolDef } from '../types';
import { draggingState } from './Dragging';
import { idleState } from './Idle';
import { pointingState } from './Pointing';

export const selectTool: ToolDef = {
  id: 'select',
  initial: 'idle',
  states: [idleState, pointingState, draggingState, panningState],
};
