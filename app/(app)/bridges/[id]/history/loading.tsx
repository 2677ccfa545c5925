import LoadingPanel from '@/components/LoadingPanel';

export default function Loading() {
  return <LoadingPanel what="the revision history" />;
}
