// Databases made and dropped on the PostgreSQL server at TEST_DATABASE_URL (CI).
import pg from 'pg';

/** Runs one statement as the server's admin connection. */
async function admin(serverUrl: string, sql: string): Promise<void> {
  const client = new pg.Client({ connectionString: serverUrl });
  await client.connect();
  await client.query(sql);
  await client.end();
}

/** Creates the database `name` on the server and answers its URL. */
export async function createServerDatabase(serverUrl: string, name: string): Promise<string> {
  await admin(serverUrl, `CREATE DATABASE ${name}`);
  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  return url.toString();
}

/** Drops the database `name` from the server, if it is there. */
export async function dropServerDatabase(serverUrl: string, name: string): Promise<void> {
  await admin(serverUrl, `DROP DATABASE IF EXISTS ${name}`);
}
