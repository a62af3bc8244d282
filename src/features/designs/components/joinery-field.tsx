import { Controller, useFormContext } from 'react-hook-form';
import { FACE_PAIRS, type DesignInput, type FacePair } from '../../../../shared/schemas/design.schema';
import { FACE_PAIR_LABELS } from '../labels';
import { ItemError } from './fields';

function move(order: FacePair[], index: number, by: -1 | 1): FacePair[] {
  const next = [...order];
  const target = index + by;
  if (target < 0 || target >= next.length) return next;
  [next[index], next[target]] = [next[target]!, next[index]!];
  return next;
}

/** The joinery precedence as an ordered list with up/down buttons. */
export function JoineryField({ readOnly }: { readOnly: boolean }) {
  const { control } = useFormContext<DesignInput>();
  return (
    <div>
      <p className="text-[13px] font-bold text-zinc-700">Joinery order</p>
      <p className="mt-0.5 mb-2 text-xs text-zinc-500">
        A pair higher in the list runs through the full outer size; the pairs below it fit between.
      </p>
      <Controller
        control={control}
        name="joinery"
        render={({ field }) => {
          const order = (field.value ?? [...FACE_PAIRS]) as FacePair[];
          return (
            <ol className="w-full max-w-md divide-y divide-zinc-100 rounded-lg border border-zinc-200 bg-white" aria-label="Joinery order">
              {order.map((pair, index) => (
                <li key={pair} className="flex items-center gap-3 px-3 py-1.5 text-sm" data-testid="joinery-item">
                  <span className="w-5 text-right text-zinc-400 tabular-nums">{index + 1}.</span>
                  <span className="flex-1 text-zinc-800">{FACE_PAIR_LABELS[pair]}</span>
                  {index === 0 ? <span className="text-xs text-zinc-500">full size</span> : null}
                  {readOnly ? null : (
                    <span className="flex gap-1">
                      <button
                        type="button"
                        className="rounded border border-zinc-200 px-1.5 text-zinc-600 hover:bg-zinc-100 disabled:opacity-30"
                        disabled={index === 0}
                        aria-label={`Move ${FACE_PAIR_LABELS[pair]} up`}
                        onClick={() => field.onChange(move(order, index, -1))}
                      >
                        ↑
                      </button>
                      <button
                        type="button"
                        className="rounded border border-zinc-200 px-1.5 text-zinc-600 hover:bg-zinc-100 disabled:opacity-30"
                        disabled={index === order.length - 1}
                        aria-label={`Move ${FACE_PAIR_LABELS[pair]} down`}
                        onClick={() => field.onChange(move(order, index, 1))}
                      >
                        ↓
                      </button>
                    </span>
                  )}
                </li>
              ))}
            </ol>
          );
        }}
      />
      <ItemError name="joinery" />
    </div>
  );
}
