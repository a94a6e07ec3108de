/** Where a room file's bytes live: rooms/<roomId>/<fileId>/original.<ext> (and thumbnail.webp beside it). */
export function roomFileKey(roomId: string, fileId: string, extension: string): string {
  return `rooms/${roomId}/${fileId}/original.${extension}`;
}

export function roomThumbnailKey(roomId: string, fileId: string): string {
  return `rooms/${roomId}/${fileId}/thumbnail.webp`;
}

/** The prefix of every object of a room. */
export function roomPrefix(roomId: string): string {
  return `rooms/${roomId}/`;
}
