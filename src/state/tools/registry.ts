// The drawing tools, in toolbar order. The toolbar, the shortcuts, the help, the
// status line, the draft layer and the tool id type all derive from this list:
// a new tool is its own module plus one line here.
import type { DrawingTool } from './tool';
import { selectTool } from './select';
import { bodyTool, enclosureTool } from './outline';
import { rectangleTool } from './rectangle';
import { tubeTool } from './tube';

export const TOOLS = [selectTool, enclosureTool, bodyTool, rectangleTool, tubeTool] as const;

export type ToolId = (typeof TOOLS)[number]['id'];

export interface ToolRegistry<Id extends string = string> {
  readonly tools: readonly DrawingTool<object, Id>[];
  /** The tool with this id; throws naming the id if there is none (a programming error). */
  get(id: string): DrawingTool<object, Id>;
  /** The tool whose shortcut is this key (any case), if any. */
  byShortcut(key: string): DrawingTool<object, Id> | undefined;
}

/** A registry over `tools`; refuses an empty list and repeated ids or shortcuts. */
export function createToolRegistry<Id extends string>(tools: readonly DrawingTool<object, Id>[]): ToolRegistry<Id> {
  if (!tools.length) throw new Error('A tool registry needs at least one tool.');
  const byId = new Map<string, DrawingTool<object, Id>>();
  const byKey = new Map<string, DrawingTool<object, Id>>();
  for (const t of tools) {
    const key = t.shortcut.toLowerCase();
    if (byId.has(t.id)) throw new Error(`Two drawing tools have the id "${t.id}".`);
    const other = byKey.get(key);
    if (other) throw new Error(`Drawing tools "${other.id}" and "${t.id}" share the shortcut "${key}".`);
    byId.set(t.id, t);
    byKey.set(key, t);
  }
  return {
    tools,
    get(id) {
      const t = byId.get(id);
      if (!t) throw new Error(`No drawing tool "${id}"; the tools are ${[...byId.keys()].join(', ')}.`);
      return t;
    },
    byShortcut: (key) => byKey.get(key.toLowerCase()),
  };
}

export const toolRegistry: ToolRegistry<ToolId> = createToolRegistry<ToolId>(TOOLS);

/** The tool first in the list, active when the app starts. */
export const DEFAULT_TOOL: ToolId = TOOLS[0].id;
