import { Fragment } from 'react';
import type { SupplyDto, UpdateSupplyInput } from '@shared/schemas/supply';
import { ScrollArea } from '@/components/ui/scroll-area';
import { canMove, groupByCategory } from '../utils/supply-order';
import { AddSupplyRow } from './add-supply-row';
import { SupplyRow } from './supply-row';

type Props = {
  tutorialId: string;
  supplies: SupplyDto[];
  grouped: boolean;
  canEdit: boolean;
  onMove: (id: string, step: -1 | 1) => void;
  onDelete: (supply: SupplyDto) => void;
  onChange: (id: string, change: UpdateSupplyInput) => Promise<unknown>;
};

const th = 'px-2 py-2 text-left text-xs font-semibold uppercase tracking-wide text-pencil';

/**
 * The supplies as a table, in list order or under their categories (as the write-up lists them),
 * with the add row at the bottom for people who may edit.
 */
export function SuppliesTable({ tutorialId, supplies, grouped, canEdit, onMove, onDelete, onChange }: Props) {
  const columns = canEdit ? 9 : 7;
  const row = (s: SupplyDto) => (
    <SupplyRow
      key={s.id}
      supply={s}
      canEdit={canEdit}
      canUp={canMove(supplies, s.id, -1, grouped)}
      canDown={canMove(supplies, s.id, 1, grouped)}
      onMove={onMove}
      onDelete={onDelete}
      onChange={onChange}
    />
  );
  return (
    <ScrollArea label="Supplies table" className="sm:rounded-lg sm:border sm:border-line sm:bg-white/60">
      <table className="stack-table w-full table-fixed sm:min-w-[76rem] border-collapse text-sm" aria-label="Supplies">
        <colgroup>
          {canEdit && <col className="w-[4.5rem]" />}
          <col className="w-36" />
          <col />
          <col className="w-28" />
          <col className="w-[15%]" />
          <col className="w-48" />
          <col className="w-24" />
          <col className="w-32" />
          {canEdit && <col className="w-20" />}
        </colgroup>
        <thead className="bg-kraft-light/40">
          <tr>
            {canEdit && (
              <th scope="col" className={th}>
                <span className="sr-only">Order</span>
              </th>
            )}
            <th scope="col" className={th}>
              Category
            </th>
            <th scope="col" className={th}>
              Name
            </th>
            <th scope="col" className={th}>
              Quantity
            </th>
            <th scope="col" className={th}>
              Note
            </th>
            <th scope="col" className={th}>
              Shop link
            </th>
            <th scope="col" className={`${th} text-center`}>
              Sponsored
            </th>
            <th scope="col" className={th}>
              Discount code
            </th>
            {canEdit && (
              <th scope="col" className={th}>
                <span className="sr-only">Delete</span>
              </th>
            )}
          </tr>
        </thead>
        {grouped ? (
          groupByCategory(supplies).map((g) => (
            <Fragment key={g.category}>
              <tbody aria-label={g.label}>
                <tr className="stack-group border-t border-line bg-paper">
                  <th scope="colgroup" colSpan={columns} className="px-3 pb-1 pt-3 text-left font-serif text-sm font-bold text-kraft-dark">
                    {g.label} <span className="font-sans text-xs font-normal text-pencil">· {g.items.length}</span>
                  </th>
                </tr>
                {g.items.map(row)}
              </tbody>
            </Fragment>
          ))
        ) : (
          <tbody>{supplies.map(row)}</tbody>
        )}
        {canEdit && <AddSupplyRow tutorialId={tutorialId} columns={{ order: true }} />}
      </table>
    </ScrollArea>
  );
}
