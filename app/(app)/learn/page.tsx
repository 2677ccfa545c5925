import type { Metadata } from 'next';
import PageHeader from '@/components/PageHeader';
import SafetyCaution from '@/components/SafetyCaution';
import { requireUser } from '@/lib/auth/server-session';
import Walkthrough from '@/components/learn/Walkthrough';

export const metadata: Metadata = { title: 'Learn' };

export default async function LearnPage() {
  await requireUser('/learn');
  return (
    <>
      <PageHeader title="Why overhang forms look the way they do" subtitle="Six short steps on a sandbox bridge. Move the sliders and the numbers and the picture are worked out again." />
      <div className="space-y-6">
        <Walkthrough />
        <SafetyCaution />
      </div>
    </>
  );
}
