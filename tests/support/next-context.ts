// Setup file of the integration project: server actions and route handlers run in-process against
// the real test database; only Next's request context (cookies, headers, cache revalidation) is
// supplied here, since there is no Next server around them.
import { vi } from "vitest";

type Store = { cookies: Map<string, string>; headers: Map<string, string> };
const g = globalThis as unknown as { __eigenroomRequest?: Store };
g.__eigenroomRequest ??= { cookies: new Map(), headers: new Map() };

vi.mock("next/headers", () => {
  const store = () => (globalThis as unknown as { __eigenroomRequest: Store }).__eigenroomRequest;
  return {
    cookies: async () => ({
      get: (name: string) => (store().cookies.has(name) ? { name, value: store().cookies.get(name)! } : undefined),
      set: (name: string, value: string) => {
        if (value === "") store().cookies.delete(name);
        else store().cookies.set(name, value);
      },
      delete: (name: string) => store().cookies.delete(name),
      has: (name: string) => store().cookies.has(name),
    }),
    headers: async () => new Headers([...store().headers]),
  };
});

vi.mock("next/cache", () => ({ revalidatePath: () => undefined, revalidateTag: () => undefined }));
