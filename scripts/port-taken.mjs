// A local stand-in whose port is taken says so in one line, naming the setting that moves it,
// instead of a stack trace.

/** Awaits `starting`; when its port is taken (or not allowed), prints one line and exits 1. */
export async function listenOrExplain(starting, { port, what, setting }) {
  try {
    return await starting;
  } catch (e) {
    const code = e && typeof e === 'object' && 'code' in e ? e.code : undefined;
    if (code !== 'EADDRINUSE' && code !== 'EACCES') throw e;
    const why = code === 'EADDRINUSE' ? 'is taken' : 'is not allowed';
    console.error(`Port ${port} ${why}, so the ${what} cannot start: set ${setting} to a free port (or stop what uses it).`);
    process.exit(1);
  }
}
