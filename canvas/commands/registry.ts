// Every editor command, registered once: menus, shortcuts, touch buttons and tests look them up here.
import { flagCommands } from './flags';
import { historyCommands } from './history';
import { inputCommands } from './inputs';
import { outlineCommands } from './outline';
import { stepCommands } from './steps';
import { supportCommands } from './supports';
import type { Command, KeyLike } from './types';
import { viewCommands } from './view';

export const allCommands = [
  ...historyCommands,
  ...outlineCommands,
  ...supportCommands,
  ...stepCommands,
  ...inputCommands,
  ...viewCommands,
  ...flagCommands,
] as const;

type AnyCommand = (typeof allCommands)[number];
export type CommandId = AnyCommand['id'];

/** Argument type of a command, by id. */
export type CommandArgs<C> = C extends Command<infer A> ? A : never;

const byId = new Map<string, Command<unknown>>();
for (const c of allCommands as readonly Command<never>[]) {
  if (byId.has(c.id)) throw new Error(`Command registered twice: ${c.id}`);
  byId.set(c.id, c as unknown as Command<unknown>);
}

/** Looks up a registered command. */
export function getCommand(id: string): Command<unknown> {
  const c = byId.get(id);
  if (!c) throw new Error(`No such command: ${id}`);
  return c;
}

/** The argument-free command whose shortcut matches the key, if any. */
export function commandForKey(e: KeyLike): Command<void> | null {
  for (const c of allCommands as readonly Command<never>[]) {
    if (c.keyTest?.(e)) return c as unknown as Command<void>;
  }
  return null;
}
