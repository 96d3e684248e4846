// Flag commands: pick a flag, zoom the plan to where it is and open its explanation.
import { zoomAt, screenPt, toScreen } from '../spaces';
import { defineCommand } from './types';

/** Scale (px per mm) at which a flag is shown when tapped: about 3 m across a tablet. */
const FOCUS_SCALE = 0.25;

export const focusFlag = defineCommand<{ index: number }>({
  id: 'flag.focus',
  label: 'Show on plan',
  edits: false,
  predicate: (s, { index }) => Boolean(s.plan.plan?.flags[index]),
  perform: (s, { index }) => {
    const flag = s.plan.plan?.flags[index];
    if (!flag) return null;
    const { width, height } = s.ui.viewport;
    const target = Math.max(s.ui.view.scale, FOCUS_SCALE);
    let view = zoomAt(s.ui.view, screenPt(width / 2, height / 2), target / s.ui.view.scale);
    const at = toScreen(view, flag.at);
    view = { ...view, x: view.x + width / 2 - at[0], y: view.y + height / 2 - at[1] };
    return {
      ui: { selection: { kind: 'flag', index }, view, panel: 'flags' },
      history: 'ignore',
    };
  },
});

export const clearSelection = defineCommand({
  id: 'edit.clearSelection',
  label: 'Clear selection',
  edits: false,
  perform: (s) => (s.ui.selection ? { ui: { selection: null }, history: 'ignore' } : null),
});

export const flagCommands = [focusFlag, clearSelection] as const;
