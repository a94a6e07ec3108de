import { db } from "@/db/client";
import { roomFor } from "@/db/queries/rooms";
import type { Actor } from "@/lib/auth/actor";
import { canOnProject, UPLOAD_KINDS } from "@/lib/auth/permissions";
import { roomFiles } from "@/lib/storage/room-files";
import { RoomFilesManager, type RoomFileView } from "./room-files-manager";

/** A room's photos, drawings and client files, with upload for those who may add them. */
export async function RoomFilesPanel({ actor, roomId }: { actor: Actor; roomId: string }) {
  const { project } = await roomFor(db, actor, roomId, "room.read");
  if (!canOnProject(actor, "file.read", project)) return null;
  const files = await roomFiles(db, actor, roomId);
  const mayDeleteAny = canOnProject(actor, "file.delete", project);
  const mayDeleteOwn = canOnProject(actor, "file.delete-own", project);
  const views: RoomFileView[] = files.map((f) => ({
    id: f.id,
    kind: f.kind,
    name: f.name,
    contentType: f.contentType,
    sizeBytes: f.sizeBytes,
    hasThumbnail: f.hasThumbnail,
    includeInReport: f.includeInReport,
    caption: f.caption,
    uploaderName: f.uploaderName,
    createdAt: f.createdAt.toISOString(),
    canDelete: mayDeleteAny || (mayDeleteOwn && f.uploadedBy === actor.userId),
  }));
  return (
    <section aria-labelledby="room-files-heading" className="mt-8">
      <h2 id="room-files-heading" className="mb-3 text-lg font-semibold">
        Photos, drawings and files
      </h2>
      <RoomFilesManager
        roomId={roomId}
        files={views}
        uploadKinds={canOnProject(actor, "file.upload", project) ? [...UPLOAD_KINDS[actor.role]] : []}
        canCurate={canOnProject(actor, "file.curate", project)}
        isClient={actor.role === "client"}
      />
    </section>
  );
}
