import { db } from "@/db/client";
import { reportFor } from "@/db/queries/reports";
import { apiRoute } from "@/lib/api/route";

type P = { reportId: string };

export const GET = apiRoute<P>(async ({ actor, params }) => ({ body: { report: (await reportFor(db, actor, params.reportId, "report.read-issued")).report } }));
