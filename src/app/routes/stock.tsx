import type { QueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { LoaderFunctionArgs } from 'react-router-dom';
import { can, type StockItemDto } from '../../../shared/schemas/api.schema';
import { PageHeader } from '../../components/layouts/app-layout';
import { Button, buttonClasses } from '../../components/ui/button';
import { Spinner } from '../../components/ui/spinner';
import { LoadError } from '../../components/ui/states';
import { stockCsvHref, stockQueryOptions, useStock } from '../../features/stock/api/stock';
import { ImportStockCsvDialog } from '../../features/stock/components/import-stock-csv';
import { StockFormDialog } from '../../features/stock/components/stock-form';
import { StockTable } from '../../features/stock/components/stock-table';
import { workshopQueryOptions, useWorkshopSettings } from '../../features/workshops/api/workshop-settings';
import { parseId } from './params';
import { requirePermission, useWorkshop, workshopTitle } from './workshop';

export const clientLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    // Viewers see plans, not the stock room.
    await requirePermission(queryClient, params, 'readStock');
    void queryClient.prefetchQuery(stockQueryOptions(parseId(params.workshopId)));
    // The currency the prices are in.
    void queryClient.prefetchQuery(workshopQueryOptions(parseId(params.workshopId)));
    return null;
  };

export function StockRoute() {
  const { workshopId, membership } = useWorkshop();
  const canManage = can(membership.role, 'manageStock');
  const stock = useStock(workshopId);
  const currency = useWorkshopSettings(workshopId).data?.currency;
  const [editing, setEditing] = useState<StockItemDto | null | 'new'>(null);
  const [importing, setImporting] = useState(false);
  return (
    <>
      <title>{workshopTitle('Stock room', membership.workshopName)}</title>
      <PageHeader
        title="Stock room"
        description="Sheets, kept offcuts (remnants) and rolls. Cut plans use remnants before new sheets."
        actions={
          <>
            <a className={buttonClasses('secondary')} href={stockCsvHref(workshopId)} download>
              Export CSV
            </a>
            {canManage ? (
              <>
                <Button onClick={() => setImporting(true)}>Import CSV</Button>
                <Button variant="primary" onClick={() => setEditing('new')}>
                  Add item
                </Button>
              </>
            ) : null}
          </>
        }
      />
      {stock.isPending ? <Spinner label="Loading the stock room…" /> : null}
      {stock.isError ? <LoadError what="the stock room" error={stock.error} onRetry={() => stock.refetch()} /> : null}
      {stock.data ? <StockTable workshopId={workshopId} items={stock.data} canManage={canManage} onEdit={setEditing} currency={currency} /> : null}
      <p className="mt-4 max-w-3xl text-[13px] text-zinc-500">
        Full sheets are heavy and awkward (a 2440 × 1220 mm sheet of 18 mm MDF weighs about 40 kg): carry them with two people or a sheet
        trolley, and follow your local rules on manual handling.
      </p>
      {canManage ? (
        <>
          <StockFormDialog workshopId={workshopId} item={editing === 'new' ? null : editing} open={editing !== null} onClose={() => setEditing(null)} />
          <ImportStockCsvDialog workshopId={workshopId} open={importing} onClose={() => setImporting(false)} />
        </>
      ) : null}
    </>
  );
}
