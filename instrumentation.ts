// Opens (and migrates) the database when the server starts; `next build` does not run this.
export async function register() {
  if (process.env.NEXT_RUNTIME === 'nodejs') {
    const { startServer } = await import('./db/server-start');
    await startServer();
  }
}
