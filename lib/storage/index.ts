export { checkUpload, cleanFileName, type CheckedUpload } from "./check-upload";
export { roomFileKey, roomPrefix, roomThumbnailKey } from "./keys";
export { ACCEPTED_TYPES, EXTENSION_OF, formatBytes, KIND_LABEL, MAX_UPLOAD_BYTES, notAcceptedMessage, PICKER_ACCEPT, ROOM_FILE_KINDS, tooLargeMessage, TYPE_LABEL } from "./limits";
export type { ObjectStorage, StoredObject } from "./object-storage";
export { createS3Storage, reshapeObject, type S3StorageConfig } from "./s3-storage";
export { extensionsOf, PROGRAM_EXTENSIONS, sniff, SNIFFED_PROGRAMS, SNIFFED_TYPES, type Sniffed } from "./sniff";
export { objectStorage } from "./storage";
export { makeThumbnail, MAX_IMAGE_PIXELS, THUMBNAIL_PX, type Thumbnail } from "./thumbnail";
export { roomFileKindSchema, roomFileUpdateSchema, roomFileUploadFieldsSchema } from "./schemas";
