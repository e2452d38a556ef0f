// Databases made and dropped on the PostgreSQL server at TEST_DATABASE_URL (CI).
import pg from 'pg';

/** Runs one statement as the server's admin connection. */
async function admin(serverUrl: string, sql: string): Promise<void> {
  const client = new pg.Client({ connectionString: serverUrl });
  await client.connect();
  await client.query(sql);
  await client.end();
}

/** The URL of database `name` on the server at `serverUrl`. */
function urlOf(serverUrl: string, name: string): string {
  const url = new URL(serverUrl);
  url.pathname = `/${name}`;
  return url.toString();
}

/** Creates the database `name` on the server (a copy of `template` if given) and answers its URL. */
export async function createServerDatabase(serverUrl: string, name: string, template?: string): Promise<string> {
  await admin(serverUrl, template ? `CREATE DATABASE ${name} TEMPLATE ${template}` : `CREATE DATABASE ${name}`);
  return urlOf(serverUrl, name);
}

/**
 * Makes the migrated template database `name` once per server, whichever test file asks first
 * (an advisory lock keeps the other workers waiting): copying it is a file copy, where migrating
 * each file's database ran every migration again.
 */
export async function ensureTemplate(serverUrl: string, name: string, migrate: (url: string) => Promise<void>): Promise<void> {
  const client = new pg.Client({ connectionString: serverUrl });
  await client.connect();
  try {
    await client.query('SELECT pg_advisory_lock(727001)');
    const { rows } = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
    if (rows.length === 0) {
      const building = `${name}_building`;
      await client.query(`DROP DATABASE IF EXISTS ${building}`);
      await client.query(`CREATE DATABASE ${building}`);
      await migrate(urlOf(serverUrl, building));
      // Renamed only once whole, so a run stopped halfway never leaves a half-migrated template.
      await client.query(`ALTER DATABASE ${building} RENAME TO ${name}`);
    }
  } finally {
    await client.query('SELECT pg_advisory_unlock(727001)').catch(() => {});
    await client.end();
  }
}

/** Drops the database `name` from the server, if it is there. */
export async function dropServerDatabase(serverUrl: string, name: string): Promise<void> {
  await admin(serverUrl, `DROP DATABASE IF EXISTS ${name}`);
}
