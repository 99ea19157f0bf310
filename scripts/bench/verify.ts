/**
 * After the save phase: do the versions in the database match what the
 * server acknowledged? Per recipe of the large workspace: 10 generated
 * versions plus one per acknowledged save, numbered 1..n without gaps or
 * repeats, the recipe's latest number equal to n, and no version without lines.
 */
import { Client } from "pg";
import { LARGE } from "./big-workspace";

export type VersionCheck = { expected: number; actual: number; badRecipes: number; withoutLines: number; examples: string[] };

export async function checkVersions(databaseUrl: string, workspaceId: string, acknowledged: Map<string, number>): Promise<VersionCheck> {
  const client = new Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const { rows } = await client.query<{ id: string; latest: number; n: string; distinct_n: string; lo: number | null; hi: number | null }>(
      `select r.id, r.latest_version_no as latest, count(v.id) as n, count(distinct v.version_no) as distinct_n, min(v.version_no) as lo, max(v.version_no) as hi
       from recipes r left join recipe_versions v on v.recipe_id = r.id
       where r.workspace_id = $1 group by r.id`,
      [workspaceId],
    );
    let expected = 0;
    let actual = 0;
    let badRecipes = 0;
    const examples: string[] = [];
    for (const r of rows) {
      const want = LARGE.versionsEach + (acknowledged.get(r.id) ?? 0);
      const n = Number(r.n);
      expected += want;
      actual += n;
      const ok = n === want && Number(r.distinct_n) === n && r.lo === 1 && r.hi === n && r.latest === n;
      if (!ok) badRecipes++;
      if (!ok && examples.length < 5) examples.push(`${r.id}: expected ${want}, found ${n} (distinct ${r.distinct_n}, ${r.lo}..${r.hi}, latest ${r.latest})`);
    }
    const lines = await client.query<{ n: string }>(
      `select count(*) as n from recipe_versions v where v.workspace_id = $1 and not exists (select 1 from recipe_version_lines l where l.version_id = v.id)`,
      [workspaceId],
    );
    return { expected, actual, badRecipes, withoutLines: Number(lines.rows[0]!.n), examples };
  } finally {
    await client.end();
  }
}
