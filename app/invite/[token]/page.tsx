import type { Metadata } from 'next';
import LinkPage from '@/components/signin/LinkPage';

// The token is in the address: no Referer carries it to another site, and no search engine keeps it.
export const metadata: Metadata = { title: 'Accept your invite', referrer: 'no-referrer', robots: { index: false, follow: false } };
export const dynamic = 'force-dynamic';

export default async function InviteLinkPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return <LinkPage purpose="invite" token={token} />;
}
