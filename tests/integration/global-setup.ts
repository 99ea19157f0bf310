import { rmSync } from "node:fs";
import { startMailSink } from "../../scripts/mail-sink";
import { clusters, dbScript, mailSinks, migrateCluster } from "../support/clusters";

/** A fresh cluster and mail sink for this run (any leftover of a crashed run is removed first). */
export default async function setup() {
  dbScript("integration", "destroy");
  dbScript("integration", "start");
  migrateCluster("integration");
  rmSync(mailSinks.integration.dir, { recursive: true, force: true });
  const sink = await startMailSink(mailSinks.integration);
  console.log(`integration: throw-away PostgreSQL on 127.0.0.1:${clusters.integration.port}, SMTP sink on ${mailSinks.integration.port}`);
  return async () => {
    await new Promise<void>((resolve) => sink.close(() => resolve()));
    dbScript("integration", "destroy");
  };
}
