// The editor's state: the design document (history applies), the frame plan (derived), and view/UI state.
import type { DesignDocument } from '@/engine/schema';
import type { FramePlan, Pt } from '@/engine/types';
import type { UnitSystem } from '@/lib/units';
import type { HistoryState } from '../history';
import type { SnapSettings } from '../snap';
import type { View } from '../spaces';

/** What the user has picked on the plan; one kind a variant (see kinds/registry.ts). */
export type Selection =
  | { kind: 'corner'; index: number }
  | { kind: 'side'; index: number }
  | { kind: 'support'; index: number }
  | { kind: 'step'; index: number }
  | { kind: 'flag'; index: number };

export type ToolId = 'select' | 'outline' | 'support';

export type SaveStatus = 'saved' | 'unsaved' | 'saving' | 'offline' | 'conflict' | 'error';

export interface Conflict {
  version: number;
  updatedAt?: string;
  updatedBy?: string | null;
}

export interface SaveState {
  status: SaveStatus;
  /** The server version this document was last read or saved as (sent with every PUT). */
  version: number;
  lastSavedAt: number | null;
  conflict: Conflict | null;
  error: string | null;
}

export interface UiState {
  tool: ToolId;
  /** The current state of the active tool's machine, for display and tests. */
  toolState: string;
  selection: Selection | null;
  /** Corners placed so far while drawing a new outline. */
  drawing: Pt[];
  /** The snapped point under the finger while drawing or creating (preview only). */
  cursor: Pt | null;
  /** A support row being created by the support tool (preview only). */
  creating: { a: Pt; b: Pt } | null;
  snapHint: 'point' | 'angle' | 'grid' | null;
  snap: SnapSettings;
  layers: { boards: boolean; dimensions: boolean; frame: boolean };
  view: View;
  viewport: { width: number; height: number };
  panel: 'inputs' | 'flags' | 'side' | 'materials';
}

export interface PlanState {
  plan: FramePlan | null;
  /** The document the plan was computed from (the plan may lag a drag by a frame). */
  planDoc: DesignDocument | null;
  error: string | null;
  ms: number | null;
  /** Where the last recompute ran. */
  via?: 'worker' | 'main';
}

export interface EditorMeta {
  designId: string;
  jobId: string;
  name: string;
  readOnly: boolean;
  units: UnitSystem;
}

export interface EditorData {
  meta: EditorMeta;
  doc: DesignDocument;
  history: HistoryState;
  ui: UiState;
  plan: PlanState;
  save: SaveState;
  /** Bumped by every edit (not by loads): autosave watches it. */
  editSeq: number;
}
