import type { Metadata } from "next";
import { TokenPage } from "../token-page";

export const metadata: Metadata = { title: "Accept invitation" };

export default async function AcceptInvitePage({ searchParams }: { searchParams: Promise<{ token?: string }> }) {
  const { token } = await searchParams;
  return <TokenPage token={token} purpose="invite" />;
}
