// The end of every switch over a kind: adding a kind breaks the build until each switch handles it.

/** Fails the build (and throws at run time) when a switch over a kind misses one (STYLE.md habit 2). */
export function exhaustive(x: never): never {
  throw new Error(`Unhandled kind: ${JSON.stringify(x)}`);
}
