import { Accounts1764600000000 } from './1764600000000-accounts';
import { Catalogue1764600100000 } from './1764600100000-catalogue';

/** Every migration, in order. Listed by hand so the same array works under ts-jest and compiled. */
export const migrations = [Accounts1764600000000, Catalogue1764600100000];
