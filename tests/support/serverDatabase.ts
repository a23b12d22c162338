import postgres from 'postgres';

export interface ServerDatabase {
  url: string;
  /** A direct connection, for counting rows and watching the service's sessions. */
  sql: postgres.Sql;
  drop(): Promise<void>;
}

/** A fresh, empty database beside the one a base URL names; the service migrates it at start. */
export async function createServerDatabase(baseUrl: string, prefix = 'fl_fault'): Promise<ServerDatabase> {
  const name = `${prefix}_${Date.now()}_${process.pid}_${Math.floor(Math.random() * 1e6)}`;
  const admin = postgres(baseUrl, { max: 1, onnotice: () => {} });
  await admin.unsafe(`create database ${name}`);
  const url = new URL(baseUrl);
  url.pathname = `/${name}`;
  const sql = postgres(url.toString(), { max: 2, onnotice: () => {} });
  return {
    url: url.toString(),
    sql,
    drop: async () => {
      await sql.end({ timeout: 5 });
      await admin.unsafe(`drop database if exists ${name} with (force)`);
      await admin.end();
    },
  };
}
