/** The expected failures of Eigenroom's server code, by code; one place turns them into HTTP. */
export type AppErrorCode =
  | "bad_request"
  | "unauthorized"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "rate_limited"
  | "payload_too_large"
  | "unsupported_media_type";

export const STATUS_OF: Record<AppErrorCode, number> = {
  bad_request: 400,
  unauthorized: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
};

/** Field path (dot-joined) → messages. */
export type FieldErrors = Record<string, string[]>;

export class AppError extends Error {
  readonly code: AppErrorCode;
  readonly fields?: FieldErrors;
  constructor(code: AppErrorCode, message: string, fields?: FieldErrors) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.fields = fields;
  }
}

export const notFound = (what = "That item") => new AppError("not_found", `${what} was not found.`);
export const forbidden = (message = "Your role does not allow this.") => new AppError("forbidden", message);
export const conflict = (message = "Someone else changed this since you opened it. Reload to see their changes.") => new AppError("conflict", message);
