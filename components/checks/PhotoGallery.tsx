// The server's own type, imported as a type only: nothing of the server code reaches the browser.
import type { AttachmentJson } from '@/lib/services/attachments';
import { dateTimeText } from '@/lib/units';

type Photo = AttachmentJson;

/** Photos and PDFs of the bridge, as thumbnails that open the full file. */
export default function PhotoGallery({ items }: { items: Photo[] }) {
  if (items.length === 0) return <p className="text-concrete-600">No photos yet. Attach one above, or from a phone at the deck edge.</p>;
  return (
    <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-5">
      {items.map((p) => (
        <li key={p.id} className="card overflow-hidden">
          <a href={p.url} target={p.content_type.startsWith('image/') ? '_blank' : undefined} rel="noopener" className="block">
            {p.content_type.startsWith('image/') ? (
              // eslint-disable-next-line @next/next/no-img-element -- photos are served behind the session; next/image's optimiser would fetch them without the cookie
              <img src={p.thumbnail_url ?? p.url} alt={p.caption || p.name} loading="lazy" className="h-28 w-full bg-concrete-100 object-cover" />
            ) : (
              <span className="flex h-28 items-center justify-center bg-concrete-100 text-sm font-bold text-concrete-700">PDF</span>
            )}
          </a>
          <div className="p-2 text-xs">
            <p className="truncate font-semibold text-concrete-900" title={p.name}>
              {p.name}
            </p>
            {p.caption ? <p className="truncate text-concrete-700">{p.caption}</p> : null}
            <p className="text-concrete-600">
              {p.check_id ? `Check #${p.check_id} · ` : ''}
              {p.by ?? 'removed user'} · {dateTimeText(p.created_at)}
            </p>
          </div>
        </li>
      ))}
    </ul>
  );
}
