'use client';

import { useRouter } from 'next/navigation';
import { useId, useRef, useState } from 'react';

type CheckOption = { id: number; label: string };

/**
 * Uploads a photo (JPEG, PNG, WebP) or a PDF through POST /api/bridges/[id]/attachments, optionally
 * for one check. The server decides the type from the file's bytes and refuses anything over 10 MB.
 */
export default function PhotoUploadForm({ bridgeId, checks }: { bridgeId: number; checks: CheckOption[] }) {
  const router = useRouter();
  const id = useId();
  const fileRef = useRef<HTMLInputElement>(null);
  const [checkId, setCheckId] = useState('');
  const [caption, setCaption] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);

  async function onSubmit(event: React.FormEvent) {
    event.preventDefault();
    const file = fileRef.current?.files?.[0];
    setError(null);
    setDone(null);
    if (!file) {
      setError('Choose a photo or a PDF first.');
      return;
    }
    if (file.size > 10 * 1024 * 1024) {
      setError('The file is larger than 10 MB. Send a smaller photo or PDF.');
      return;
    }
    const form = new FormData();
    form.append('file', file);
    if (checkId) form.append('check_id', checkId);
    if (caption.trim()) form.append('caption', caption.trim());
    setBusy(true);
    try {
      const res = await fetch(`/api/bridges/${bridgeId}/attachments`, { method: 'POST', body: form });
      const body = (await res.json().catch(() => ({}))) as { error?: string; name?: string };
      if (!res.ok) throw new Error(body.error ?? `The server answered ${res.status}.`);
      setDone(`Attached ${body.name ?? file.name}.`);
      setCaption('');
      setCheckId('');
      if (fileRef.current) fileRef.current.value = '';
      router.refresh();
    } catch (err) {
      setError(err instanceof TypeError ? 'The server could not be reached. Check the connection and try again.' : (err as Error).message);
    }
    setBusy(false);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="card grid gap-3 p-4 md:grid-cols-[1fr_1fr_1fr_auto] md:items-end">
      <div>
        <label htmlFor={`${id}-file`} className="field-label">
          Photo or PDF (max 10 MB)
        </label>
        <input id={`${id}-file`} ref={fileRef} type="file" accept="image/jpeg,image/png,image/webp,application/pdf" capture="environment" className="mt-1 block w-full text-sm" />
      </div>
      <div>
        <label htmlFor={`${id}-check`} className="field-label">
          For check
        </label>
        <select id={`${id}-check`} value={checkId} onChange={(e) => setCheckId(e.target.value)} className="field-input">
          <option value="">The bridge in general</option>
          {checks.map((c) => (
            <option key={c.id} value={c.id}>
              {c.label}
            </option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor={`${id}-caption`} className="field-label">
          Caption <span className="font-normal text-concrete-500">(optional)</span>
        </label>
        <input id={`${id}-caption`} value={caption} maxLength={300} onChange={(e) => setCaption(e.target.value)} className="field-input" />
      </div>
      <button type="submit" className="btn-primary" disabled={busy}>
        {busy ? 'Uploading…' : 'Attach'}
      </button>
      {error ? (
        <p role="alert" className="field-error md:col-span-4">
          {error}
        </p>
      ) : null}
      {done ? (
        <p role="status" className="text-sm text-pass-700 md:col-span-4">
          {done}
        </p>
      ) : null}
    </form>
  );
}
