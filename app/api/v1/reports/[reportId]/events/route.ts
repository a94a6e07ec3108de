import { db } from "@/db/client";
import { listProjectEvents, reportFor } from "@/db/queries/reports";
import { apiRoute } from "@/lib/api/route";

type P = { reportId: string };

export const GET = apiRoute<P>(async ({ actor, params }) => {
  const { report } = await reportFor(db, actor, params.reportId, "report.read");
  const events = await listProjectEvents(db, actor, report.projectId);
  return { body: { events: events.filter((e) => e.reportId === report.id) } };
});
