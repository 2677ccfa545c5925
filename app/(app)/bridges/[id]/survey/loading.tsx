import LoadingPanel from '@/components/LoadingPanel';

export default function Loading() {
  return <LoadingPanel what="the top-of-girder survey" />;
}
