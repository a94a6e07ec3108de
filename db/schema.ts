import type { ColumnType, Generated, Insertable, Selectable, Updateable } from "kysely";

/** Columns the database fills in (defaults) but that may be given on insert. */
type Defaulted<T> = ColumnType<T, T | undefined, T>;
type Timestamp = ColumnType<Date, Date | string | undefined, Date | string>;

export type Role = "owner" | "engineer" | "builder" | "client";
export type UnitSystem = "metric" | "imperial";
export type ProjectStatus = "survey" | "design" | "build" | "delivered" | "closed";

export interface FirmsTable {
  id: Generated<string>;
  name: string;
  contact_email: string | null;
  created_at: Timestamp;
}

export interface UsersTable {
  id: string;
  firm_id: string;
  email: string;
  name: string;
  role: Role;
  password_hash: string | null;
  unit_system: Defaulted<UnitSystem>;
  active: Defaulted<boolean>;
  created_at: Timestamp;
}

export interface UserSessionsTable {
  id: string;
  user_id: string;
  expires_at: Date;
}

export interface AuthTokensTable {
  token_hash: string;
  purpose: "password-reset" | "invitation";
  user_id: string;
  expires_at: Date;
  used_at: Date | null;
  created_at: Timestamp;
}

export interface LoginAttemptsTable {
  id: Generated<number>;
  key: string;
  succeeded: boolean;
  attempted_at: Timestamp;
}

export interface ProjectsTable {
  id: Generated<string>;
  firm_id: string;
  name: string;
  client_name: string;
  client_user_id: string | null;
  site_address: Defaulted<string>;
  status: Defaulted<ProjectStatus>;
  notes: Defaulted<string>;
  version: Defaulted<number>;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface ProjectBuildersTable {
  project_id: string;
  user_id: string;
}

export interface RoomsTable {
  id: Generated<string>;
  project_id: string;
  name: string;
  length_m: number;
  width_m: number;
  height_m: number;
  temperature_c: Defaulted<number>;
  humidity_pct: Defaulted<number>;
  notes: Defaulted<string>;
  version: Defaulted<number>;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface DevOutboxTable {
  id: Generated<number>;
  received_at: Timestamp;
  envelope_from: string | null;
  envelope_to: string[];
  subject: string | null;
  text_body: string | null;
  html_body: string | null;
  raw: string;
  attachments: ColumnType<{ filename: string | null; contentType: string; size: number }[], string | undefined, string>;
}

export interface DemoSeedTable {
  id: number;
  seeded_at: Timestamp;
}

export type PaperSize = "A4" | "LETTER";
export type ReportRevisionStatus = "draft" | "issued" | "superseded";
export type ReportEventKind = "drafted" | "issued" | "superseded" | "sent" | "viewed" | "downloaded" | "approved" | "question" | "answer";

export interface FirmReportSettingsTable {
  firm_id: string;
  attach_pdf: Defaulted<boolean>;
  signing_certificate_ref: Defaulted<string>;
  certificate_fingerprint: string | null;
  updated_at: Timestamp;
}

export interface ReportNumberCountersTable {
  year: number;
  last_number: number;
}

export interface ReportsTable {
  id: Generated<string>;
  firm_id: string;
  project_id: string;
  room_id: string;
  number: string;
  created_by: string | null;
  created_at: Timestamp;
}

export interface ReportRevisionsTable {
  id: Generated<string>;
  report_id: string;
  revision: number;
  status: Defaulted<ReportRevisionStatus>;
  scenario_ids: Defaulted<string[]>;
  paper_size: Defaulted<PaperSize>;
  note: Defaulted<string>;
  pdf: Buffer | null;
  sha256: string | null;
  page_count: number | null;
  signed_by: string | null;
  signer_name: string | null;
  signed_at: Date | null;
  certificate_fingerprint: string | null;
  engine_version: string | null;
  superseded_at: Date | null;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface ReportEventsTable {
  id: Generated<number>;
  report_id: string;
  revision_id: string | null;
  kind: ReportEventKind;
  actor_user_id: string | null;
  actor_name: string;
  detail: ColumnType<Record<string, unknown>, string | undefined, string>;
  at: Timestamp;
}

export interface ReportCommentsTable {
  id: Generated<string>;
  report_id: string;
  revision_id: string | null;
  kind: "question" | "answer";
  author_user_id: string | null;
  author_name: string;
  body: string;
  created_at: Timestamp;
}

export interface ReportApprovalsTable {
  id: Generated<string>;
  report_id: string;
  revision_id: string;
  user_id: string | null;
  user_name: string;
  note: Defaulted<string>;
  approved_at: Timestamp;
}

// Room workspace (migration 2026-12-01T20-00-workspace). JSON columns hold values of the zod schemas
// in lib/schemas/workspace.ts; they are written as JSON text and read back parsed.
type Json<T> = ColumnType<T, string, string>;

export interface RoomSurfacesTable {
  room_id: string;
  surface: "front" | "rear" | "left" | "right" | "floor" | "ceiling";
  finish: Json<unknown>;
  openings: ColumnType<unknown, string | undefined, string>;
  assumed: Defaulted<boolean>;
  updated_at: Timestamp;
}

export interface RoomPositionsTable {
  id: Generated<string>;
  room_id: string;
  kind: "seat" | "main-speaker" | "subwoofer";
  name: string;
  x_m: number;
  y_m: number;
  z_m: number;
  is_main: Defaulted<boolean>;
  delay_ms: Defaulted<number>;
  polarity: Defaulted<number>;
  drives_bass: Defaulted<boolean>;
  sort_order: Defaulted<number>;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface ScenariosTable {
  id: Generated<string>;
  room_id: string;
  name: string;
  notes: Defaulted<string>;
  is_baseline: Defaulted<boolean>;
  archived_at: ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
  target: ColumnType<unknown, string | undefined, string>;
  version: Defaulted<number>;
  results: ColumnType<unknown | null, string | null | undefined, string | null>;
  engine_version: string | null;
  inputs_hash: string | null;
  computed_at: ColumnType<Date | null, Date | string | null | undefined, Date | string | null>;
  sort_order: Defaulted<number>;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface TreatmentItemsTable {
  id: Generated<string>;
  scenario_id: string;
  name: string;
  kind: "porous-panel" | "corner-trap" | "membrane" | "perforated";
  spec: Json<unknown>;
  count: number;
  placements: ColumnType<unknown, string | undefined, string>;
  unit_cost: Defaulted<number>;
  unit_mass_kg: number | null;
  build_id: string | null;
  notes: Defaulted<string>;
  sort_order: Defaulted<number>;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface BuildsTable {
  id: Generated<string>;
  firm_id: string;
  name: string;
  kind: "porous-panel" | "corner-trap" | "membrane" | "perforated";
  spec: Json<unknown>;
  notes: Defaulted<string>;
  version: Defaulted<number>;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export type RoomFileKind = "photo" | "drawing" | "client-file";
export type StoredContentType = "image/jpeg" | "image/png" | "image/webp" | "application/pdf";
export type FeeBasis = "per-report" | "per-project";
export type InvoiceStatus = "open" | "paid" | "void";

export interface RoomFilesTable {
  id: Generated<string>;
  room_id: string;
  uploaded_by: string | null;
  uploader_name: string;
  kind: RoomFileKind;
  original_name: string;
  content_type: StoredContentType;
  size_bytes: number;
  sha256: string;
  storage_key: string;
  thumbnail_key: string | null;
  width_px: number | null;
  height_px: number | null;
  include_in_report: Defaulted<boolean>;
  caption: Defaulted<string>;
  created_at: Timestamp;
}

export interface StorageDeletionsTable {
  storage_key: string;
  queued_at: Timestamp;
  attempts: Defaulted<number>;
}

export interface FeesTable {
  firm_id: string;
  basis: FeeBasis;
  amount_minor: number;
  currency: string;
  downloads_wait_for_payment: Defaulted<boolean>;
  updated_by: string | null;
  updated_at: Timestamp;
}

export interface InvoicesTable {
  id: Generated<string>;
  firm_id: string;
  project_id: string;
  report_id: string | null;
  description: string;
  amount_minor: number;
  currency: string;
  status: Defaulted<InvoiceStatus>;
  checkout_session_id: string | null;
  checkout_url: string | null;
  paid_at: Date | null;
  voided_at: Date | null;
  created_by: string | null;
  created_at: Timestamp;
  updated_at: Timestamp;
}

export interface PaymentEventsTable {
  id: Generated<number>;
  provider_event_id: string;
  type: string;
  invoice_id: string | null;
  outcome: string;
  payload: ColumnType<unknown, string, string>;
  received_at: Timestamp;
}

// Build sheet and site progress (migration 2026-12-01T21-45-build-progress).
export interface FirmPriceListsTable {
  firm_id: string;
  currency: Defaulted<string>;
  lumber_thickness_m: number;
  lumber_width_m: number;
  lumber_density_kg_m3: Defaulted<number>;
  lumber_basis: "per-metre" | "per-board";
  lumber_price_per_m: Defaulted<number>;
  /** [{ lengthM, price }] */
  boards: ColumnType<{ lengthM: number; price: number }[], string, string>;
  kerf_m: Defaulted<number>;
  slab_standard: UnitSystem;
  slab_length_m: number;
  slab_width_m: number;
  /** [{ thicknessM, price }] */
  slab_prices: ColumnType<{ thicknessM: number; price: number }[], string, string>;
  fabric_price_per_m2: Defaulted<number>;
  fabric_wrap_m: Defaulted<number>;
  sheet_length_m: Defaulted<number>;
  sheet_width_m: Defaulted<number>;
  sheet_price: Defaulted<number>;
  screw_price: Defaulted<number>;
  cleat_price: Defaulted<number>;
  bracket_price: Defaulted<number>;
  version: Defaulted<number>;
  updated_by: string | null;
  updated_at: Timestamp;
}

type DateColumn = ColumnType<string | null, string | null | undefined, string | null>;

export interface TreatmentItemProgressTable {
  item_id: string;
  built_at: DateColumn;
  built_by: string | null;
  built_by_name: string | null;
  installed_at: DateColumn;
  installed_by: string | null;
  installed_by_name: string | null;
  note: Defaulted<string>;
  updated_at: Timestamp;
}

export interface RoomBuildScenariosTable {
  room_id: string;
  scenario_id: string;
  chosen_by: string | null;
  chosen_at: Timestamp;
}

export interface Database {
  firms: FirmsTable;
  users: UsersTable;
  user_sessions: UserSessionsTable;
  auth_tokens: AuthTokensTable;
  login_attempts: LoginAttemptsTable;
  projects: ProjectsTable;
  project_builders: ProjectBuildersTable;
  rooms: RoomsTable;
  dev_outbox: DevOutboxTable;
  demo_seed: DemoSeedTable;
  room_surfaces: RoomSurfacesTable;
  room_positions: RoomPositionsTable;
  scenarios: ScenariosTable;
  treatment_items: TreatmentItemsTable;
  builds: BuildsTable;
  firm_report_settings: FirmReportSettingsTable;
  report_number_counters: ReportNumberCountersTable;
  reports: ReportsTable;
  report_revisions: ReportRevisionsTable;
  report_events: ReportEventsTable;
  report_comments: ReportCommentsTable;
  report_approvals: ReportApprovalsTable;
  room_files: RoomFilesTable;
  storage_deletions: StorageDeletionsTable;
  fees: FeesTable;
  invoices: InvoicesTable;
  payment_events: PaymentEventsTable;
  firm_price_lists: FirmPriceListsTable;
  treatment_item_progress: TreatmentItemProgressTable;
  room_build_scenarios: RoomBuildScenariosTable;
}

export type UserRow = Selectable<UsersTable>;
export type NewUser = Insertable<UsersTable>;
export type ProjectRow = Selectable<ProjectsTable>;
export type ProjectUpdate = Updateable<ProjectsTable>;
export type RoomRow = Selectable<RoomsTable>;
export type FirmRow = Selectable<FirmsTable>;
