import Link from 'next/link';

/**
 * "Bridges / <bridge> / <page>" above every bridge page; the last part is plain text. Hidden on paper.
 */
export default function BridgeBreadcrumb({ bridge, here }: { bridge: { id: number; name: string }; here?: string }) {
  return (
    <nav aria-label="Breadcrumb" className="no-print mb-2 text-sm">
      <Link href="/bridges" className="text-brand-700 hover:underline">
        Bridges
      </Link>
      <span className="text-concrete-500"> / </span>
      {here ? (
        <>
          <Link href={`/bridges/${bridge.id}`} className="text-brand-700 hover:underline">
            {bridge.name}
          </Link>
          <span className="text-concrete-500"> / {here}</span>
        </>
      ) : (
        <span className="text-concrete-500">{bridge.name}</span>
      )}
    </nav>
  );
}
