"use client";

import { createColumnHelper } from "@tanstack/react-table";
import Link from "next/link";
import { DataTable, type TableFeatureSet } from "@/components/ui/data-table";
import { PROJECT_STATUS_LABEL } from "@/lib/schemas/project";
import type { ProjectStatus } from "@/db/schema";

export interface ProjectListItem {
  id: string;
  name: string;
  clientName: string;
  siteAddress: string;
  status: ProjectStatus;
  roomCount: number;
  updatedAt: string; // ISO
}

const helper = createColumnHelper<TableFeatureSet, ProjectListItem>();
const dateFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric" });

const columns = helper.columns([
  helper.accessor("name", {
    header: "Project",
    sortFn: "text",
    cell: (c) => (
      <Link href={`/projects/${c.row.original.id}`} className="font-medium text-ink underline-offset-2 hover:text-kiln-600 hover:underline">
        {c.getValue()}
      </Link>
    ),
  }),
  helper.accessor("clientName", { header: "Client", sortFn: "text" }),
  helper.accessor("siteAddress", { header: "Site", sortFn: "text", cell: (c) => <span className="text-ink-soft">{c.getValue() || "—"}</span> }),
  helper.accessor("status", {
    header: "Stage",
    cell: (c) => <span className="rounded-full border border-paper-line bg-paper-sunk px-2 py-0.5 text-xs">{PROJECT_STATUS_LABEL[c.getValue()]}</span>,
  }),
  helper.accessor("roomCount", { header: "Rooms", cell: (c) => <span className="tabular-nums">{c.getValue()}</span> }),
  helper.accessor("updatedAt", { header: "Updated", sortFn: "text", cell: (c) => <time dateTime={c.getValue()}>{dateFormat.format(new Date(c.getValue()))}</time> }),
]);

export function ProjectsTable({ projects }: { projects: ProjectListItem[] }) {
  return <DataTable columns={columns} data={projects} searchLabel="Search projects, clients, sites" caption="Projects" />;
}
