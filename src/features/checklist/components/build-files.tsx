import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { UploadDto } from '../../../../shared/schemas/api.schema';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-client';
import { formatNumber } from '../../../lib/format';
import { driversQueryOptions, useBuildFiles, useDeleteBuildFile, useUploadBuildFile } from '../api/build-files';

function DriversTable({ workshopId, upload }: { workshopId: number; upload: UploadDto }) {
  const drivers = useQuery(driversQueryOptions(workshopId, upload.id));
  if (!drivers.data) return null;
  return (
    <table className="mt-2 w-full text-left text-[13px]">
      <thead className="text-zinc-500">
        <tr>
          <th className="pr-3 font-normal">Driver</th>
          <th className="pr-3 text-right font-normal">Cut-out</th>
          <th className="pr-3 text-right font-normal">Displacement</th>
          <th className="pr-3 text-right font-normal">Cone area</th>
          <th className="text-right font-normal">Excursion</th>
        </tr>
      </thead>
      <tbody className="tabular-nums">
        {drivers.data.map((d) => (
          <tr key={d.name}>
            <td className="pr-3">{d.name}</td>
            <td className="pr-3 text-right">{formatNumber(d.cutoutDiameterMm)} mm</td>
            <td className="pr-3 text-right">{formatNumber(d.displacementLitres, 2)} L</td>
            <td className="pr-3 text-right">{formatNumber(d.coneAreaCm2)} cm²</td>
            <td className="text-right">{formatNumber(d.excursionMm)} mm</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** Photos (JPEG, PNG) and drivers' parameter files attached to the build. */
export function BuildFiles({ workshopId, buildId, canUpload }: { workshopId: number; buildId: number; canUpload: boolean }) {
  const files = useBuildFiles(workshopId, buildId);
  const upload = useUploadBuildFile(workshopId, buildId);
  const remove = useDeleteBuildFile(workshopId, buildId);
  const [kind, setKind] = useState<'photo' | 'drivers-csv'>('photo');
  const photos = files.data?.filter((f) => f.kind === 'photo') ?? [];
  const others = files.data?.filter((f) => f.kind !== 'photo') ?? [];
  const error = upload.error;

  return (
    <div className="space-y-4">
      {canUpload ? (
        <div className="flex flex-wrap items-end gap-3">
          <label className="text-[13px] text-zinc-600">
            What
            <select className="mt-1 block h-11 rounded-md border border-zinc-300 bg-white px-2 text-sm" value={kind} onChange={(e) => setKind(e.target.value as 'photo' | 'drivers-csv')}>
              <option value="photo">Photo (JPEG or PNG, up to 10 MB)</option>
              <option value="drivers-csv">Drivers' parameters (CSV, up to 1 MB)</option>
            </select>
          </label>
          <label className="text-[13px] text-zinc-600">
            File
            <input
              type="file"
              accept={kind === 'photo' ? 'image/jpeg,image/png' : '.csv,text/csv'}
              className="mt-1 block text-sm"
              onChange={(e) => {
                const file = e.target.files?.[0];
                if (file) upload.mutate({ kind, file });
                e.target.value = '';
              }}
            />
          </label>
          {upload.isPending ? <span className="text-sm text-zinc-500">Uploading…</span> : null}
        </div>
      ) : null}
      {kind === 'drivers-csv' && canUpload ? (
        <p className="text-[13px] text-zinc-500">
          Columns: <code>name, cutout_diameter_mm, displacement_litres, cone_area_cm2, excursion_mm</code>.
        </p>
      ) : null}
      {error ? (
        <Alert tone="error">
          {error.message}
          {isApiError(error) && Object.keys(error.fields).length > 1 ? (
            <ul className="mt-1 list-disc pl-5">
              {Object.entries(error.fields).map(([k, v]) => (
                <li key={k}>
                  {k}: {v}
                </li>
              ))}
            </ul>
          ) : null}
        </Alert>
      ) : null}
      {files.data?.length === 0 ? <p className="text-sm text-zinc-500">No photos or files yet.</p> : null}
      {photos.length ? (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          {photos.map((p) => (
            <li key={p.id} className="overflow-hidden rounded-lg border border-zinc-200 bg-white">
              <a href={p.url} target="_blank" rel="noreferrer">
                <img src={p.url} alt={p.name} className="aspect-[4/3] w-full object-cover" loading="lazy" />
              </a>
              <div className="flex items-center gap-2 px-2 py-1 text-[13px]">
                <span className="min-w-0 flex-1 truncate text-zinc-600" title={`${p.name} · ${p.uploadedBy}`}>
                  {p.name}
                </span>
                {canUpload ? (
                  <Button size="sm" variant="ghost" onClick={() => remove.mutate(p.id)}>
                    Remove
                  </Button>
                ) : null}
              </div>
            </li>
          ))}
        </ul>
      ) : null}
      {others.map((f) => (
        <div key={f.id} className="rounded-lg border border-zinc-200 bg-white px-3 py-2">
          <div className="flex items-center gap-2 text-sm">
            <a href={f.url} className="min-w-0 flex-1 truncate text-accent-700 underline" download>
              {f.name}
            </a>
            {canUpload ? (
              <Button size="sm" variant="ghost" onClick={() => remove.mutate(f.id)}>
                Remove
              </Button>
            ) : null}
          </div>
          {f.kind === 'drivers-csv' ? <DriversTable workshopId={workshopId} upload={f} /> : null}
        </div>
      ))}
    </div>
  );
}
