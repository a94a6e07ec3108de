import { priceListInputSchema } from "@/lib/schemas/build-sheet";
import { db } from "@/db/client";
import { getPriceList, savePriceList } from "@/db/queries/price-lists";
import { apiRoute, readJson } from "@/lib/api/route";

/** The firm's price list and stock sizes (`price-list.read`); `priceList` is null before the owner sets one. */
export const GET = apiRoute(async ({ actor }) => ({ body: { priceList: await getPriceList(db, actor) } }));

/** Sets the firm's price list (`price-list.manage`: owner); send the version read (0 for the first). */
export const PUT = apiRoute(async ({ request, actor }) => {
  const input = await readJson(request, priceListInputSchema);
  return { body: { priceList: await savePriceList(db, actor, input) } };
});
