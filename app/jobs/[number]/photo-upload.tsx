'use client';

import { useRef, useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { uploadJobPhotos } from '@/lib/jobs/job-actions';
import { FormStatus } from '@/app/_components/form-status';
import { callAction } from '@/lib/errors/call-action';
import { photoSizeProblems } from '@/lib/jobs/photo-rules';

export function PhotoUpload({ jobId }: { jobId: string }) {
  const router = useRouter();
  const fileRef = useRef<HTMLInputElement>(null);
  const [kind, setKind] = useState('DAMAGE');
  const [pending, startTransition] = useTransition();
  const [summary, setSummary] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  const upload = () =>
    startTransition(async () => {
      const files = Array.from(fileRef.current?.files ?? []);
      // Checked here first: an over-size body would be refused by the server before it could answer.
      const problems = files.length === 0 ? ['Choose at least one photo to add.'] : photoSizeProblems(files);
      if (problems.length) return setSummary({ tone: 'bad', text: problems.join(' ') });
      const fd = new FormData();
      fd.set('jobId', jobId);
      fd.set('kind', kind);
      for (const f of files) fd.append('photos', f);
      const result = await callAction(() => uploadJobPhotos(fd));
      setSummary(result.ok ? { tone: 'ok', text: result.message ?? 'Photos added.' } : { tone: 'bad', text: result.message });
      if (result.ok) {
        if (fileRef.current) fileRef.current.value = '';
        router.refresh();
      }
    });
  return (
    <div className="no-print">
      <FormStatus message={summary?.text} tone={summary?.tone ?? 'ok'} />
      <div className="row">
        <label htmlFor="photo-kind" className="sr-only">
          Photo kind
        </label>
        <select id="photo-kind" value={kind} onChange={(e) => setKind(e.target.value)} style={{ width: 'auto' }}>
          <option value="NAMEPLATE">Nameplate</option>
          <option value="DAMAGE">Damage</option>
          <option value="OTHER">Other</option>
        </select>
        <label htmlFor="photo-files" className="sr-only">
          Photos to add
        </label>
        <input id="photo-files" ref={fileRef} type="file" accept="image/*" multiple style={{ width: 'auto' }} />
        <button type="button" className="btn quiet" onClick={upload} disabled={pending}>
          {pending ? 'Uploading…' : 'Add photos'}
        </button>
      </div>
    </div>
  );
}
