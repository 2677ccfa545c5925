import Link from 'next/link';

/** A plain page for a signed-in user whose role may not use a screen. */
export default function RoleNotice({ title, message }: { title: string; message: string }) {
  return (
    <div className="card max-w-xl p-6">
      <h1 className="text-xl font-bold text-concrete-900">{title}</h1>
      <p className="mt-2 text-concrete-700">{message}</p>
      <Link href="/bridges" className="btn-secondary mt-4">
        Back to bridges
      </Link>
    </div>
  );
}
