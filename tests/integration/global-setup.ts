import { rmSync } from "node:fs";
import { startFakeS3 } from "../../scripts/fake-s3";
import { startMailSink } from "../../scripts/mail-sink";
import { clusters, dbScript, fakeS3s, mailSinks, migrateCluster } from "../support/clusters";

/** A fresh cluster, mail sink and fake S3 for this run (any leftover of a crashed run is removed first). */
export default async function setup() {
  dbScript("integration", "destroy");
  dbScript("integration", "start");
  migrateCluster("integration");
  rmSync(mailSinks.integration.dir, { recursive: true, force: true });
  const sink = await startMailSink(mailSinks.integration);
  rmSync(fakeS3s.integration.dir, { recursive: true, force: true });
  const s3 = await startFakeS3(fakeS3s.integration);
  console.log(
    `integration: throw-away PostgreSQL on 127.0.0.1:${clusters.integration.port}, SMTP sink on ${mailSinks.integration.port}, S3 on ${s3.port}`,
  );
  return async () => {
    await new Promise<void>((resolve) => sink.close(() => resolve()));
    await s3.close();
    rmSync(fakeS3s.integration.dir, { recursive: true, force: true });
    dbScript("integration", "destroy");
  };
}
