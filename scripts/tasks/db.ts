/** `npm run db:stop` / `db:start` / `db:status` for the project's own clusters (dev by default, `--test` for the test one). */
import { devCluster, testCluster, stopCluster, ensureCluster } from "../lib/postgres.ts";
import { log } from "../lib/paths.ts";

const [action] = process.argv.slice(2);
const cluster = process.argv.includes("--test") ? testCluster() : devCluster();
switch (action) {
  case "stop":
    stopCluster(cluster);
    break;
  case "start":
  case "status": {
    const info = ensureCluster(cluster);
    log(`PostgreSQL "${cluster.name}" on 127.0.0.1:${info.port}, data in ${info.dataDir}`);
    break;
  }
  default:
    console.error("usage: db <start|stop|status> [--test]");
    process.exit(2);
}
