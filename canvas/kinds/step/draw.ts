// Steps: the flight's footprint and its tread lines, from the engine's step plan.
import type { StepPlan } from '@/engine/types';
import type { View } from '../../spaces';
import { sx, sy, type Ctx } from '../../layers/paint';
import { palette } from '../member/style';

export function drawSteps(ctx: Ctx, v: View, steps: StepPlan[], selected: number | null) {
  for (const st of steps) {
    if (st.outline.length < 3) continue;
    ctx.beginPath();
    st.outline.forEach((p, i) =>
      i ? ctx.lineTo(sx(v, p), sy(v, p)) : ctx.moveTo(sx(v, p), sy(v, p)),
    );
    ctx.closePath();
    ctx.fillStyle = palette.step;
    ctx.fill();
    ctx.strokeStyle = st.index === selected ? palette.selected : palette.stepEdge;
    ctx.lineWidth = st.index === selected ? 2.5 : 1.25;
    ctx.stroke();
  }
}
