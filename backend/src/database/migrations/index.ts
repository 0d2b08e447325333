import { Accounts1764600000000 } from './1764600000000-accounts';
import { Catalogue1764600100000 } from './1764600100000-catalogue';
import { Knowledge1764600200000 } from './1764600200000-knowledge';
import { VehiclesJobs1764600300000 } from './1764600300000-vehicles-jobs';
import { Estimates1764600310000 } from './1764600310000-estimates';
import { FieldReports1764600400000 } from './1764600400000-field-reports';
import { Imports1764600500000 } from './1764600500000-imports';
import { CacheVersions1764600600000 } from './1764600600000-cache-versions';
import { SignInFailures1764600700000 } from './1764600700000-sign-in-failures';
import { ThrottleHits1764600850000 } from './1764600850000-throttle-hits';

/** Every migration, in order. Listed by hand so the same array works under ts-jest and compiled. */
export const migrations = [Accounts1764600000000, Catalogue1764600100000, Knowledge1764600200000, VehiclesJobs1764600300000, Estimates1764600310000, FieldReports1764600400000, Imports1764600500000, CacheVersions1764600600000, SignInFailures1764600700000, ThrottleHits1764600850000];
