import { InitialSchema1796162620410 } from './1796162620410-InitialSchema.js';

/** Every migration in the order it runs; add a new one at the end (see DEVELOPERS.md). */
export const migrations = [InitialSchema1796162620410];
