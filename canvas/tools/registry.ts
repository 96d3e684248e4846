// Every tool, registered once.
import type { ToolId } from '../store/types';
import { outlineTool } from './outline';
import { selectTool } from './select';
import { supportTool } from './support';
import type { ToolDef } from './types';

export const tools: Record<ToolId, ToolDef> = {
  select: selectTool,
  outline: outlineTool,
  support: supportTool,
};
