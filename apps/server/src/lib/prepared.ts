import type { Knex } from 'knex';
import type { Db } from './db';

interface PgConnection {
  query(config: { name: string; text: string; values: unknown[] }): Promise<{ rows: unknown[] }>;
}

/**
 * Runs a named prepared statement (PostgreSQL PREPARE through node-postgres' `name`): each
 * connection parses and plans the text once and afterwards only binds values. For the hot
 * station queries planning costs more than running. Inside a transaction (`db` is a `trx`) the
 * statement runs on the transaction's own connection.
 */
export async function preparedRows<Row>(db: Db, name: string, text: string, values: unknown[]): Promise<Row[]> {
  const client = db.client as Knex.Client;
  const connection = (await client.acquireConnection()) as PgConnection;
  // Announced like knex's own statements, so `db.on('query')` listeners (tests, debugging) see it.
  const query = { sql: text, bindings: values, name, method: 'raw' };
  client.emit('query', query);
  try {
    const result = await connection.query({ name, text, values });
    client.emit('query-response', result, query);
    return result.rows as Row[];
  } catch (error) {
    client.emit('query-error', error, query);
    throw error;
  } finally {
    await client.releaseConnection(connection);
  }
}
