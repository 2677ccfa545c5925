import Link from 'next/link';

export default function BridgeNotFound() {
  return (
    <div className="card max-w-xl p-6">
      <h1 className="text-xl font-bold text-concrete-900">No such bridge</h1>
      <p className="mt-2 text-concrete-700">This bridge does not exist or has been deleted. Pick one from the list of bridges.</p>
      <Link href="/bridges" className="btn-secondary mt-4">
        Back to bridges
      </Link>
    </div>
  );
}
