/**
 * The role × action matrix of money figures on surfaces outside Costing. Each
 * row names who gets the figures; a role that gets the page but not its money
 * counts as "forbidden" (a 200 without any price), a leak fails as "leak".
 * Rights: the rule ("production and viewer do not see prices unless
 * the owner allows it", a workspace setting) — product rule, no outside source.
 * Price-only routes (quotes, their CSV, current prices, the least-cost mix)
 * are in matrix-ingredients.test.ts and matrix-least-cost.test.ts with the
 * costs.read right they need while costs are not shared; here, shared.
 */
import { GET as getIngredients } from "@/app/api/ingredients/route";
import { GET as getLot } from "@/app/api/lots/[lotId]/route";
import { POST as postLeastCost } from "@/app/api/least-cost/route";
import { GET as getLots } from "@/app/api/lots/route";
import { GET as getOverview } from "@/app/api/overview/route";
import { GET as getCurrentPrices } from "@/app/api/prices/current/route";
import { GET as exportQuotes } from "@/app/api/quotes/export/route";
import { GET as getQuotes } from "@/app/api/quotes/route";
import { GET as getRecipes } from "@/app/api/recipes/route";
import type { Permission } from "@/lib/auth/permissions";
import { setShowCostsToAll } from "@/lib/data/cost-visibility";
import { createTestLot } from "../support/lots";
import { makeIngredient } from "../support/ingredients";
import { referenceIds } from "../support/recipe-fixtures";
import { base, fromStatus, jsonRequest, params, runMatrix, type MatrixContext, type MatrixRow, type Outcome } from "../support/matrix";

const get = (path: string) => new Request(`${base}${path}`);

/** "ok" with money, "forbidden" for a 200 that carries none, "leak" for anything in between. */
async function moneyOutcome(res: Response, shown: (body: Record<string, unknown>) => boolean, hidden: (body: Record<string, unknown>) => boolean): Promise<Outcome> {
  if (res.status !== 200) return fromStatus(res.status);
  const body = (await res.json()) as Record<string, unknown>;
  if (shown(body)) return "ok";
  return hidden(body) ? "forbidden" : "leak";
}

type Rows = Record<string, unknown>[];

function rows(shared: boolean): MatrixRow[] {
  // With the setting on everyone may see costs: the rows then need only the page's own read right.
  const right = (read: Permission): Permission => (shared ? read : "costs.read");
  const prepare = async ({ team, caller }: MatrixContext) => {
    if (shared && caller !== "outsider") await setShowCostsToAll({ workspaceId: team.workspaceId, show: true });
  };
  return [
    {
      name: "GET /api/ingredients (current prices)",
      permission: right("ingredients.read"),
      outsider: "ok",
      run: async (ctx) => {
        await prepare(ctx);
        await makeIngredient(ctx.team.workspaceId);
        return moneyOutcome(
          await getIngredients(get("/api/ingredients"), params()),
          (b) => b.pricesShown === true && (b.ingredients as Rows).every((i) => "currentPrice" in i),
          (b) => b.pricesShown === false && (b.ingredients as Rows).every((i) => !("currentPrice" in i)),
        );
      },
    },
    {
      name: "GET /api/lots (nib cost)",
      permission: right("lots.read"),
      outsider: "ok",
      run: async (ctx) => {
        await prepare(ctx);
        await createTestLot(ctx.team.workspaceId);
        return moneyOutcome(
          await getLots(get("/api/lots"), params()),
          (b) => b.costsShown === true && (b.lots as Rows).every((l) => l.nibCost !== null),
          (b) => b.costsShown === false && (b.lots as Rows).every((l) => l.nibCost === null),
        );
      },
    },
    {
      name: "GET /api/lots/:lotId (price paid, costs, nib cost)",
      permission: right("lots.read"),
      outsider: "not_found",
      run: async (ctx) => {
        await prepare(ctx);
        const lot = await createTestLot(ctx.team.workspaceId);
        return moneyOutcome(
          await getLot(get(`/api/lots/${lot.id}`), params({ lotId: lot.id })),
          (b) => b.costsShown === true && (b.lot as { pricePaid: unknown }).pricePaid === "500.0000" && b.nibCost !== null,
          (b) => b.costsShown === false && (b.lot as { pricePaid: unknown }).pricePaid === null && b.nibCost === null && (b.costs as Rows).length === 0,
        );
      },
    },
    {
      name: "GET /api/recipes (cost per bar)",
      permission: right("recipes.readReleased"),
      outsider: "ok",
      run: async (ctx) => {
        await prepare(ctx);
        return moneyOutcome(
          await getRecipes(get("/api/recipes?sort=cost"), params()),
          (b) => b.costsShown === true,
          (b) => b.costsShown === false && (b.rows as Rows).every((r) => r.costPerBar === null),
        );
      },
    },
    {
      name: "GET /api/overview (margins of released bars)",
      permission: right("workspace.read"),
      outsider: "ok", // the outsider's own workspace
      run: async (ctx) => {
        await prepare(ctx);
        return moneyOutcome(
          await getOverview(get("/api/overview"), params()),
          (b) => b.margins !== null && typeof b.margins === "object",
          (b) => b.margins === null && !JSON.stringify(b).toLowerCase().includes("price"),
        );
      },
    },
    ...(shared
      ? ([
          ["GET /api/quotes", getQuotes, "/api/quotes"],
          ["GET /api/quotes/export", exportQuotes, "/api/quotes/export"],
        ] as const).map(([name, route, path]): MatrixRow => ({
          name,
          permission: "ingredients.read",
          outsider: "ok",
          run: async (ctx) => {
            await prepare(ctx);
            return fromStatus((await route(get(path), params())).status);
          },
        }))
      : []),
    ...(shared
      ? [
          {
            name: "POST /api/least-cost",
            permission: "recipes.read",
            outsider: "ok", // solves with the caller's own library
            run: async (ctx: MatrixContext) => {
              await prepare(ctx);
              const ids = await referenceIds(ctx.caller === "outsider" ? ctx.other.workspaceId : ctx.team.workspaceId);
              const request = { lines: [{ ingredientId: ids.nibs, percent: "70" }, { ingredientId: ids.sugar, percent: "30" }] };
              return fromStatus((await postLeastCost(jsonRequest("POST", "/api/least-cost", request), params())).status);
            },
          } satisfies MatrixRow,
          {
            name: "GET /api/prices/current",
            permission: "ingredients.read",
            outsider: "ok",
            run: async (ctx: MatrixContext) => {
              await prepare(ctx);
              const id = (await makeIngredient(ctx.team.workspaceId)).id;
              return fromStatus((await getCurrentPrices(get(`/api/prices/current?ingredientIds=${id}`), params())).status);
            },
          } satisfies MatrixRow,
        ]
      : []),
  ];
}

runMatrix("costs-hidden", rows(false));
runMatrix("costs-shared", rows(true));
