import { migratedSnapshot } from '../tests/db/snapshot';
await migratedSnapshot('/tmp/s10/pgl');
