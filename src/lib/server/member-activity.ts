// Which requests come first in this process: those carrying a session (members). Anonymous cut
// sheets start only while none is in flight, so a stranger's render never runs ahead of a member's
// request: on one event loop, each step of a member's request would otherwise wait for a render.
let active = 0;
let waiting: (() => void)[] = [];

/** Marks a request with a session cookie as in flight; call the answer when it is done. */
export function memberRequestStarted(request: Request): () => void {
  if (!/better-auth\.session_token=/.test(request.headers.get('cookie') ?? '')) return () => {};
  active += 1;
  let done = false;
  return () => {
    if (done) return;
    done = true;
    active -= 1;
    if (active === 0) {
      const go = waiting;
      waiting = [];
      // After pending I/O, so a member's next request already read off the socket still comes first.
      setImmediate(() => go.forEach((f) => f()));
    }
  };
}

/** Resolves once no member request is in flight, always after pending I/O (a member's request just arrived counts). */
export async function whenMembersIdle(): Promise<void> {
  await new Promise((resolve) => setImmediate(resolve));
  while (active > 0) await new Promise<void>((resolve) => waiting.push(resolve));
}
