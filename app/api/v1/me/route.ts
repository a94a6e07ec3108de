import { apiRoute } from "@/lib/api/route";

export const GET = apiRoute(async ({ actor }) => ({ body: { user: actor } }));
