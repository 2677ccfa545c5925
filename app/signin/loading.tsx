import LoadingPanel from '@/components/LoadingPanel';

export default function Loading() {
  return (
    <div className="p-8">
      <LoadingPanel what="sign-in" />
    </div>
  );
}
