import { clusters, dbScript, migrateCluster } from "../support/clusters";

/** A fresh cluster for this run (any leftover of a crashed run is removed first). */
export default function setup() {
  dbScript("integration", "destroy");
  dbScript("integration", "start");
  migrateCluster("integration");
  console.log(`integration: throw-away PostgreSQL on 127.0.0.1:${clusters.integration.port}`);
  return () => dbScript("integration", "destroy");
}
