/**
 * `npm run db:stop` / `db:start` / `db:status` for the project's own clusters (dev by default, `--test` for the test one),
 * and `npm run db:backup [-- file]` / `npm run db:restore -- file` (`--database name` picks another database than the default).
 */
import { devCluster, testCluster, stopCluster, ensureCluster } from "../lib/postgres.ts";
import { backupDatabase, defaultDatabase, restoreDatabase } from "../lib/backup.ts";
import { log } from "../lib/paths.ts";

const argv = process.argv.slice(2);
const [action] = argv;
const cluster = argv.includes("--test") ? testCluster() : devCluster();
const databaseIndex = argv.indexOf("--database");
const database = (databaseIndex >= 0 ? argv[databaseIndex + 1] : undefined) ?? defaultDatabase(cluster);
/** The first argument that is neither the action, a flag nor a flag's value: the backup file. */
const file = argv.slice(1).find((a, i, rest) => !a.startsWith("--") && rest[i - 1] !== "--database");

function usage(): never {
  console.error("usage: db <start|stop|status> [--test]\n       db backup [file] [--test] [--database name]\n       db restore <file> [--test] [--database name]");
  process.exit(2);
}

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
  case "backup": {
    const result = await backupDatabase({ cluster, database, file });
    log(`backed up database "${database}" (${cluster.name} cluster) to ${result.file} (${Math.round(result.bytes / 1024)} kB)`);
    break;
  }
  case "restore": {
    if (!file) usage();
    await restoreDatabase({ cluster, database, file });
    log(`restored ${file} into database "${database}" (${cluster.name} cluster)`);
    break;
  }
  default:
    usage();
}
