/** Links to a cut plan's exports (the server sends each as a download with a readable file name). */
export type ExportFile = 'cut-diagrams.pdf' | 'cut-diagrams.svg' | 'cut-list.csv' | 'panels.dxf' | 'stencils.pdf';

export function exportHref(workshopId: number, planId: number, file: ExportFile, params: Record<string, string | number | undefined> = {}): string {
  const query = Object.entries(params)
    .filter(([, v]) => v !== undefined && v !== '')
    .map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(String(v))}`)
    .join('&');
  return `/api/workshops/${workshopId}/cut-plans/${planId}/exports/${file}${query ? `?${query}` : ''}`;
}
