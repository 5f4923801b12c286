import { DATABASE_URL } from 'astro:env/server';
import { connectDatabase } from '@db/connect.ts';

/** The app's one database handle (a pg Pool behind Kysely). Server-only. */
export const db = connectDatabase(DATABASE_URL);
