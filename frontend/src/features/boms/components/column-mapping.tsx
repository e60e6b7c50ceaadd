import { BOM_FIELDS, BOM_FIELD_LABELS, type BomPreview } from '@understudy/shared-types';
import { InlineSelect, cx } from '../../../components/ui';
import { choiceNote, dataRows, type ColumnChoice } from '../lib/mapping';

const OPTIONS: ReadonlyArray<{ value: ColumnChoice; label: string }> = [
  ...BOM_FIELDS.map((f) => ({ value: f, label: f === 'partNumber' ? `${BOM_FIELD_LABELS[f]} (required)` : BOM_FIELD_LABELS[f] })),
  { value: 'ignore', label: 'Ignore' },
];

function columnName(preview: BomPreview, index: number): string {
  const header = preview.columns[index]?.header;
  return header ? `Column ${index + 1} (${header})` : `Column ${index + 1}`;
}

/** The first rows as read, with a choice above each column of what it holds. */
export function ColumnMapping({
  preview,
  choices,
  onChoose,
  missingPartNumber,
}: {
  preview: BomPreview;
  choices: readonly ColumnChoice[];
  onChoose: (index: number, choice: ColumnChoice) => void;
  /** Marks the table when saving was tried with no part-number column. */
  missingPartNumber?: boolean;
}) {
  const rows = dataRows(preview);
  return (
    <div className={cx('overflow-x-auto rounded-md border', missingPartNumber ? 'border-danger' : 'border-rule')}>
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">The first rows, with what each column holds</caption>
        <thead>
          <tr className="border-b border-rule bg-paper/60 align-top">
            {preview.columns.map((c) => {
              const choice = choices[c.index] ?? 'ignore';
              const note = choiceNote(preview, c.index, choice);
              return (
                <th key={c.index} scope="col" className="min-w-52 px-3 py-2.5 font-normal">
                  <InlineSelect
                    aria-label={`${columnName(preview, c.index)} holds`}
                    value={choice}
                    onValueChange={(value) => onChoose(c.index, value as ColumnChoice)}
                    options={OPTIONS}
                    className={cx('w-full', choice === 'ignore' ? 'text-ink-soft' : 'font-semibold')}
                  />
                  <span className="mt-1 block min-h-4 text-xs text-ink-faint">{note}</span>
                </th>
              );
            })}
          </tr>
          {preview.hasHeader && (
            <tr className="border-b border-rule-strong bg-paper/40">
              {preview.columns.map((c) => (
                <th key={c.index} scope="col" className="px-3 py-2 text-xs font-semibold tracking-wide text-ink-soft uppercase">
                  {c.header}
                </th>
              ))}
            </tr>
          )}
        </thead>
        <tbody>
          {rows.map((cells, r) => (
            <tr key={r} className="border-b border-rule last:border-b-0">
              {preview.columns.map((c) => (
                <td
                  key={c.index}
                  className={cx('max-w-60 truncate px-3 py-1.5 font-mono text-xs', (choices[c.index] ?? 'ignore') === 'ignore' ? 'text-ink-faint' : 'text-ink')}
                >
                  {cells[c.index] ?? ''}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
