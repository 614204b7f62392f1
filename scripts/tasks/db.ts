/**
 * `npm run db:stop` / `db:start` / `db:status` for the project's own clusters (dev by default, `--test` for the test one),
 * and `npm run db:backup [-- file]` / `npm run db:restore -- file` (`--database name` picks another database than the default).
 * A backup is one archive of the database and the file store the server's configuration names
 * (STORAGE_DRIVER: the local STORAGE_DIR, or the S3 bucket).
 */
import { devCluster, testCluster, stopCluster, ensureCluster } from "../lib/postgres.ts";
import { backupArchive, defaultDatabase, restoreArchive } from "../lib/backup.ts";
import { log } from "../lib/paths.ts";
import { parseEnv } from "../../server/env.ts";
import { createStorage } from "../../server/lib/storage/index.ts";

const argv = process.argv.slice(2);
const [action] = argv;
const cluster = argv.includes("--test") ? testCluster() : devCluster();
const databaseIndex = argv.indexOf("--database");
const database = (databaseIndex >= 0 ? argv[databaseIndex + 1] : undefined) ?? defaultDatabase(cluster);
/** The first argument that is neither the action, a flag nor a flag's value: the backup file. */
const file = argv.slice(1).find((a, i, rest) => !a.startsWith("--") && rest[i - 1] !== "--database");

/** The file store as the server would open it (the database URL is not needed here). */
function fileStorage() {
  return createStorage(parseEnv({ DATABASE_URL: "postgres://backup@127.0.0.1/unused", APP_ORIGIN: "http://127.0.0.1:3000", ...process.env }));
}

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
    const result = await backupArchive({ cluster, database, file, storage: fileStorage() });
    log(`backed up database "${database}" (${cluster.name} cluster) and ${result.fileCount} stored files to ${result.file} (${Math.round(result.bytes / 1024)} kB, readable by its owner only)`);
    break;
  }
  case "restore": {
    if (!file) usage();
    const result = await restoreArchive({ cluster, database, file, storage: fileStorage() });
    log(`restored ${file} into database "${database}" (${cluster.name} cluster) and ${result.fileCount} stored files; every session and password-reset link from before is void`);
    break;
  }
  default:
    usage();
}
