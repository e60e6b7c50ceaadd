import {
  FAMILIES,
  MAX_COMPARE,
  parseSupplySpan,
  type ParameterDefinition,
  type PartDto,
} from '@understudy/shared-types';
import { useId, useState, type ReactNode } from 'react';
import { Link, useSearchParams } from 'react-router';
import {
  CadmiumCaution,
  CadmiumMark,
  Card,
  EmptyState,
  LifecycleBadge,
  PageHeader,
  RohsBadge,
  SectionHeading,
  Spinner,
  buttonClasses,
  cx,
} from '../../../components/ui';
import { LightResponseChart, SupplyRangeChart, type LightCell, type SupplyRangeSeries } from '../../../components/ui/charts';
import { isApiClientError } from '../../../lib/api-client';
import { containsCadmium, formatConditions, packageLabel, pinLayoutFor, summarizeParameter, unionOfParameters } from '../../../lib/part-display';
import { useCompareParts } from '../api/get-compare-parts';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The ids in the address, de-duplicated, well-formed, at most MAX_COMPARE. */
export function readCompareIds(params: URLSearchParams): { ids: string[]; dropped: number } {
  const all = [...new Set((params.get('ids') ?? '').split(',').map((s) => s.trim()).filter((s) => UUID.test(s)))];
  return { ids: all.slice(0, MAX_COMPARE), dropped: Math.max(0, all.length - MAX_COMPARE) };
}

interface Row {
  id: string;
  label: string;
  hint?: string;
  /** What is compared: equal keys mean equal values. */
  key: (part: PartDto) => string;
  render: (part: PartDto) => ReactNode;
}

function parameterRow(def: ParameterDefinition): Row {
  return {
    id: `parameters.${def.key}`,
    label: def.label,
    key: (p) => JSON.stringify(p.parameters[def.key] ?? null),
    render: (p) => {
      const value = p.parameters[def.key];
      const summary = summarizeParameter(def, value);
      if (!summary) return <span className="text-ink-faint">—</span>;
      const conditions = formatConditions(value?.conditions);
      return (
        <span className="flex flex-col">
          <span className="tabular-nums">
            {summary.text}
            {summary.qualifier && <span className="ml-1 text-[0.6875rem] font-semibold text-ink-faint uppercase">{summary.qualifier}</span>}
          </span>
          {conditions && <span className="text-xs text-ink-faint">{conditions}</span>}
        </span>
      );
    },
  };
}

const BASIC_ROWS: Row[] = [
  { id: 'family', label: 'Family', key: (p) => p.family, render: (p) => FAMILIES[p.family].label },
  { id: 'manufacturer', label: 'Manufacturer', key: (p) => p.manufacturer.name, render: (p) => p.manufacturer.name },
  { id: 'lifecycle', label: 'Lifecycle', key: (p) => p.lifecycle, render: (p) => <LifecycleBadge lifecycle={p.lifecycle} short /> },
  { id: 'rohs', label: 'RoHS', key: (p) => p.rohsStatus, render: (p) => <RohsBadge status={p.rohsStatus} short /> },
  { id: 'package', label: 'Package', key: (p) => p.package, render: (p) => (p.package ? packageLabel(p.package) : <span className="text-ink-faint">—</span>) },
  {
    id: 'pinLayout',
    label: 'Pin layout',
    key: (p) => `${p.pinLayout ?? ''}|${JSON.stringify(p.pinMap)}`,
    render: (p) => pinLayoutFor(p.pinLayout)?.label ?? (Object.keys(p.pinMap).length > 0 ? 'Own pin map' : <span className="text-ink-faint">—</span>),
  },
];

export function rowDiffers(row: Pick<Row, 'key'>, parts: readonly PartDto[]): boolean {
  return new Set(parts.map((p) => row.key(p))).size > 1;
}

function supplySeries(parts: readonly PartDto[]): SupplyRangeSeries[] {
  return parts
    .filter((p) => FAMILIES[p.family].parameters.some((d) => d.key === 'supplyVoltage'))
    .map((p) => ({ id: p.id, label: p.partNumber, min: p.parameters.supplyVoltage?.min, max: p.parameters.supplyVoltage?.max }));
}

function lightCells(parts: readonly PartDto[]): LightCell[] {
  return parts
    .filter((p) => p.family === 'photoresistor')
    .map((p) => ({
      id: p.id,
      label: p.partNumber,
      lightMin: p.parameters.lightResistance?.min,
      lightMax: p.parameters.lightResistance?.max,
      gamma: p.parameters.gamma?.typ,
    }));
}

function SupplyMarkerField({ text, onText, error }: { text: string; onText: (t: string) => void; error?: string }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-0.5">
      <label htmlFor={id} className="text-xs font-semibold text-ink-soft">
        Your supply
      </label>
      <input
        id={id}
        value={text}
        onChange={(event) => onText(event.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-note`}
        placeholder="9 V, ±12 V, 18"
        className={cx('h-9 w-36 rounded-md border bg-card px-2.5 text-sm text-ink', error ? 'border-danger' : 'border-rule-strong')}
      />
      <p id={`${id}-note`} className="text-xs text-danger">
        {error}
      </p>
    </div>
  );
}

/**
 * Up to six parts side by side. Rows are every parameter any of them has; a row whose values differ is shaded so
 * the differences stand out. Charts follow where the parts have the figures for them.
 */
export function CompareView() {
  const [params, setParams] = useSearchParams();
  const { ids, dropped } = readCompareIds(params);
  const results = useCompareParts(ids);
  const [onlyDifferences, setOnlyDifferences] = useState(false);
  const [markerText, setMarkerText] = useState('9 V');

  const parts = results.flatMap((r) => (r.data ? [r.data] : []));
  const loading = results.some((r) => r.isPending);
  const failed = results
    .map((r, i) => ({ id: ids[i]!, error: r.error }))
    .filter((r) => r.error);

  const remove = (id: string) => {
    const next = new URLSearchParams(params);
    const rest = ids.filter((i) => i !== id);
    if (rest.length > 0) next.set('ids', rest.join(','));
    else next.delete('ids');
    setParams(next, { replace: true, preventScrollReset: true });
  };

  const header = (
    <PageHeader
      title="Compare parts"
      description="Side by side, every parameter any of them states. Shaded rows differ."
      actions={
        <Link to="/parts" className={buttonClasses('secondary', 'sm')}>
          Back to the catalog
        </Link>
      }
    />
  );

  if (ids.length === 0) {
    return (
      <>
        {header}
        <EmptyState
          title="Nothing to compare yet"
          action={
            <Link to="/parts" className={buttonClasses('primary')}>
              Open the catalog
            </Link>
          }
        >
          Tick up to {MAX_COMPARE} parts in the catalog, then press Compare.
        </EmptyState>
      </>
    );
  }

  const families = [...new Set(parts.map((p) => p.family))].map((k) => FAMILIES[k]);
  const rows: Row[] = [
    ...BASIC_ROWS,
    ...unionOfParameters(families)
      .filter((def) => parts.some((p) => p.parameters[def.key] !== undefined))
      .map(parameterRow),
  ];
  const shownRows = onlyDifferences ? rows.filter((r) => rowDiffers(r, parts)) : rows;
  const supply = supplySeries(parts);
  const cells = lightCells(parts);
  const marker = parseSupplySpan(markerText, { unit: 'V' });
  const markerVolts = marker.ok ? marker.max : undefined;
  const anyCadmium = parts.some((p) => containsCadmium(p.parameters));

  return (
    <div className="flex flex-col gap-6">
      {header}
      {dropped > 0 && (
        <p role="status" className="text-sm text-warn">
          Only the first {MAX_COMPARE} parts are compared; {dropped} more in the link were left out.
        </p>
      )}
      {failed.length > 0 && (
        <ul role="alert" className="flex flex-col gap-1 text-sm text-danger">
          {failed.map((f) => (
            <li key={f.id}>
              {isApiClientError(f.error) && f.error.status === 404 ? 'A part in this link no longer exists' : f.error?.message}
              <button type="button" onClick={() => remove(f.id)} className="ml-2 font-semibold underline">
                Drop it
              </button>
            </li>
          ))}
        </ul>
      )}
      {anyCadmium && <CadmiumCaution />}

      <Card aria-labelledby="compare-table-title">
        <SectionHeading
          id="compare-table-title"
          aside={
            <label className="flex items-center gap-2 text-sm text-ink-soft">
              <input type="checkbox" checked={onlyDifferences} onChange={(e) => setOnlyDifferences(e.target.checked)} className="size-4 accent-copper" />
              Only rows that differ
            </label>
          }
        >
          {parts.length} {parts.length === 1 ? 'part' : 'parts'} {loading && <Spinner className="ml-2 inline text-copper" />}
        </SectionHeading>
        <div className="overflow-x-auto">
          <table className="w-full border-separate border-spacing-0 text-sm">
            <caption className="sr-only">Parameters side by side; rows whose values differ are marked</caption>
            <thead>
              <tr>
                <td className="sticky left-0 z-[1] border-b border-rule-strong bg-card px-4 py-3" />
                {parts.map((p) => (
                  <th key={p.id} scope="col" className="min-w-40 border-b border-rule-strong px-4 py-3 text-left align-top">
                    <span className="flex items-center gap-1.5">
                      <Link to={`/parts/${p.id}`} className="font-semibold text-ink underline-offset-2 hover:text-copper-deep hover:underline">
                        {p.partNumber}
                      </Link>
                      {containsCadmium(p.parameters) && <CadmiumMark />}
                    </span>
                    <span className="block text-xs font-normal text-ink-soft">{p.manufacturer.name}</span>
                    <button
                      type="button"
                      onClick={() => remove(p.id)}
                      className="mt-1 text-xs font-semibold text-copper-deep hover:underline"
                      aria-label={`Remove ${p.partNumber} from the comparison`}
                    >
                      Remove
                    </button>
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {shownRows.map((row) => {
                const differs = parts.length > 1 && rowDiffers(row, parts);
                return (
                  <tr key={row.id} data-row={row.id} data-differs={differs || undefined}>
                    <th
                      scope="row"
                      className={cx(
                        'sticky left-0 z-[1] border-b border-rule px-4 py-2 text-left font-medium whitespace-nowrap text-ink',
                        differs ? 'bg-copper-wash' : 'bg-card',
                      )}
                    >
                      {differs && <span aria-hidden="true" className="mr-1.5 inline-block size-1.5 rounded-full bg-copper align-middle" />}
                      {row.label}
                      {differs && <span className="sr-only"> (values differ)</span>}
                    </th>
                    {parts.map((p) => (
                      <td key={p.id} className={cx('border-b border-rule px-4 py-2 align-top text-ink', differs && 'bg-copper-wash/50')}>
                        {row.render(p)}
                      </td>
                    ))}
                  </tr>
                );
              })}
              {shownRows.length === 0 && (
                <tr>
                  <td colSpan={parts.length + 1} className="px-4 py-6 text-center text-ink-soft">
                    These parts agree on every parameter they state.
                  </td>
                </tr>
              )}
            </tbody>
          </table>
        </div>
      </Card>

      {supply.length > 0 && (
        <Card className="p-5">
          <SupplyRangeChart
            series={supply}
            marker={markerVolts}
            onMarkerChange={(v) => setMarkerText(`${v} V`)}
            controls={<SupplyMarkerField text={markerText} onText={setMarkerText} error={marker.ok ? undefined : marker.error} />}
          />
        </Card>
      )}
      {cells.length > 0 && (
        <Card className="p-5">
          <LightResponseChart cells={cells} />
        </Card>
      )}
    </div>
  );
}
