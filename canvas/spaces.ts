// World millimetres (plan, y up) and screen pixels (Konva, y down) are distinct; convert only here.
import type { Pt } from '@/engine/types';

/** A point in screen pixels relative to the stage's top-left corner. */
export type ScreenPt = readonly [number, number] & { readonly __space: 'screen' };
/** An angle in degrees, counter-clockwise from the +x axis of the plan. */
export type Degrees = number & { readonly __unit: 'deg' };
/** An angle in radians. */
export type Radians = number & { readonly __unit: 'rad' };

export const screenPt = (x: number, y: number): ScreenPt => [x, y] as unknown as ScreenPt;
export const deg = (n: number): Degrees => n as Degrees;
export const rad = (n: number): Radians => n as Radians;
export const toRadians = (d: Degrees): Radians => rad((d * Math.PI) / 180);
export const toDegrees = (r: Radians): Degrees => deg((r * 180) / Math.PI);

/** The view: pixels per millimetre, and where world (0, 0) sits on screen. */
export interface View {
  scale: number;
  x: number;
  y: number;
}

export const MIN_SCALE = 0.005; // 5 px per metre
export const MAX_SCALE = 2; // 2 px per millimetre

/** World mm to screen px. */
export function toScreen(view: View, p: Pt): ScreenPt {
  return screenPt(p[0] * view.scale + view.x, -p[1] * view.scale + view.y);
}

/** Screen px to world mm. */
export function toWorld(view: View, s: ScreenPt): Pt {
  return [(s[0] - view.x) / view.scale, -(s[1] - view.y) / view.scale];
}

/** A screen distance in px expressed in world mm at this view. */
export function pxToMm(view: View, px: number): number {
  return px / view.scale;
}

const clampScale = (s: number) => Math.min(MAX_SCALE, Math.max(MIN_SCALE, s));

/** Zooms by `factor` keeping the world point under `at` fixed on screen. */
export function zoomAt(view: View, at: ScreenPt, factor: number): View {
  const scale = clampScale(view.scale * factor);
  const world = toWorld(view, at);
  return { scale, x: at[0] - world[0] * scale, y: at[1] + world[1] * scale };
}

/** Moves the view by a screen offset. */
export function panBy(view: View, dx: number, dy: number): View {
  return { ...view, x: view.x + dx, y: view.y + dy };
}

/** A view that shows the bounds inside a viewport of the given size with a margin in px. */
export function fitView(
  bounds: { minX: number; minY: number; maxX: number; maxY: number },
  size: { width: number; height: number },
  margin = 48,
): View {
  const w = Math.max(1, bounds.maxX - bounds.minX);
  const h = Math.max(1, bounds.maxY - bounds.minY);
  const availW = Math.max(40, size.width - 2 * margin);
  const availH = Math.max(40, size.height - 2 * margin);
  const scale = clampScale(Math.min(availW / w, availH / h));
  const cx = (bounds.minX + bounds.maxX) / 2;
  const cy = (bounds.minY + bounds.maxY) / 2;
  return { scale, x: size.width / 2 - cx * scale, y: size.height / 2 + cy * scale };
}
