import { sequelize } from '../models';

/** Whether the app's own connection pool reaches the database (the health check). */
export async function databaseUp(): Promise<boolean> {
  try {
    await sequelize.query('SELECT 1');
    return true;
  } catch {
    return false;
  }
}
