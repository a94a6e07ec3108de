import { raiseInvoiceSchema } from "@/lib/payments/schemas";
import { roomFileUpdateSchema } from "@/lib/storage/schemas";
import type { EndpointDoc } from "./openapi";

/**
 * Room files (issue 7, uploads) and the engineering fee (issue 7, payments). The upload is
 * multipart/form-data (`file`, `kind`, `caption`), so it has no JSON body schema here.
 */
export const FILES_PAYMENTS_ENDPOINTS: EndpointDoc[] = [
  { method: "get", path: "/rooms/{roomId}/files", summary: "The room's photos, drawings and client files", tag: "Files", success: 200 },
  {
    method: "post",
    path: "/rooms/{roomId}/files",
    summary: "Upload a file (multipart/form-data: file, kind photo|drawing|client-file, caption). JPEG, PNG, WebP or PDF by content, at most 20 MB; programs are refused (415), larger files 413. Builders add photos, clients their own files",
    tag: "Files",
    success: 201,
  },
  { method: "get", path: "/rooms/{roomId}/files/{fileId}", summary: "One file's metadata and a download link valid for five minutes", tag: "Files", success: 200 },
  { method: "patch", path: "/rooms/{roomId}/files/{fileId}", summary: "Choose a photo for the report or caption it (owner, engineer)", tag: "Files", body: roomFileUpdateSchema, success: 200 },
  { method: "delete", path: "/rooms/{roomId}/files/{fileId}", summary: "Delete a file and its stored bytes (staff any; builders and clients their own)", tag: "Files", success: 204 },
  {
    method: "get",
    path: "/rooms/{roomId}/files/{fileId}/content",
    summary: "The file's bytes",
    tag: "Files",
    success: 200,
    query: [
      { name: "variant", description: "`thumbnail` for the WebP thumbnail of an image" },
      { name: "download", description: "`1` to save rather than show" },
    ],
  },
  { method: "get", path: "/invoices", summary: "A project's invoices (owner, engineer, the project's client)", tag: "Payments", success: 200, query: [{ name: "projectId", description: "The project", required: true }] },
  { method: "post", path: "/invoices", summary: "Raise an invoice for the firm's fee (owner, engineer); a per-report fee names the report", tag: "Payments", body: raiseInvoiceSchema, success: 201, conflict: true },
  { method: "get", path: "/invoices/{invoiceId}", summary: "One invoice", tag: "Payments", success: 200 },
  { method: "post", path: "/invoices/{invoiceId}/checkout", summary: "Start paying (the project's client): answers the hosted checkout page's url", tag: "Payments", success: 200, conflict: true },
  { method: "post", path: "/invoices/{invoiceId}/void", summary: "Void an open invoice (owner, engineer)", tag: "Payments", success: 200, conflict: true },
  {
    method: "post",
    path: "/payments/webhook",
    summary: "The payment provider's events, verified by the Stripe-Signature header over the raw body (400 when it does not match); a replayed event changes nothing",
    tag: "Payments",
    success: 200,
    public: true,
  },
];
