"use client";

import { useRouter } from "next/navigation";
import { toast } from "sonner";
import { deleteProjectAction, deleteRoomAction } from "@/app/(app)/projects/actions";
import { ConfirmButton } from "@/components/ui/confirm-button";

export function DeleteProjectButton({ projectId, name, roomCount }: { projectId: string; name: string; roomCount: number }) {
  const router = useRouter();
  return (
    <ConfirmButton
      label="Delete project"
      title={`Delete “${name}”?`}
      onConfirm={async () => {
        const r = await deleteProjectAction(projectId);
        if (!r.ok) return r.message;
        toast.success(`Deleted ${name}`);
        router.push("/projects");
        router.refresh();
      }}
    >
      This removes the project and its {roomCount} room{roomCount === 1 ? "" : "s"} with every analysis in them. It cannot be undone.
    </ConfirmButton>
  );
}

export function DeleteRoomButton({ roomId, projectId, name }: { roomId: string; projectId: string; name: string }) {
  const router = useRouter();
  return (
    <ConfirmButton
      label="Delete room"
      title={`Delete “${name}”?`}
      onConfirm={async () => {
        const r = await deleteRoomAction(roomId, projectId);
        if (!r.ok) return r.message;
        toast.success(`Deleted ${name}`);
        router.push(`/projects/${projectId}`);
        router.refresh();
      }}
    >
      The room, its surfaces, positions and scenarios will be removed. It cannot be undone.
    </ConfirmButton>
  );
}
