// `npm run db:stop`: stops the cluster that `npm start` uses (if it is running).
import { findPostgresBin, log } from './lib/system.mjs';
import { stopCluster, isClusterRunning } from './lib/postgres.mjs';
import { clusterLocation } from './lib/cluster.mjs';

const bin = findPostgresBin();
const { dir } = clusterLocation();
if (!bin || !isClusterRunning(bin, dir)) log('the database is not running.');
else {
  stopCluster(bin, dir);
  log(`stopped the database in ${dir}.`);
}
