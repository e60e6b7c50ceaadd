import {
  FAMILIES,
  MAX_COMPARE,
  PINOUT_CLASS_LABELS,
  parseSupplySpan,
  type PartDto,
  type Weights,
} from '@understudy/shared-types';
import { useId, useState } from 'react';
import { Link } from 'react-router';
import {
  Button,
  CadmiumCaution,
  Card,
  EmptyState,
  ErrorState,
  LifecycleBadge,
  LoadingState,
  RohsBadge,
  SectionHeading,
  Spinner,
  buttonClasses,
  cx,
} from '../../../components/ui';
import { SupplyRangeChart, type SupplyRangeSeries } from '../../../components/ui/charts';
import { PartQueryState } from '../../../components/ui/part-query-state';
import { useDebouncedValue } from '../../../hooks/use-debounced-value';
import { containsCadmium, packageLabel, pinLayoutFor } from '../../../lib/part-display';
import { alternatesApiQuery, useAlternates } from '../api/get-alternates';
import { rulingFor, useEquivalents } from '../api/get-equivalents';
import { usePart } from '../api/get-part';
import { LIMIT_STEP, MAX_LIMIT, useAlternatesParams } from '../hooks/use-alternates-params';
import { keyFacts, supplySpanOf } from '../lib/display';
import { isDefaultWeights, weightsFromParam, weightsParam } from '../lib/weights';
import { AlternatesTable } from './alternates-table';
import { OptocouplerPanel } from './optocoupler-panel';
import { PairsSection } from './pairs-section';
import { PartPicker } from './part-picker';
import { UnsuitableList } from './unsuitable-list';
import { WeightsPanel } from './weights-panel';

/** Long enough to let a slider settle, short enough that the order seems to follow the hand. */
export const RERANK_DEBOUNCE_MS = 250;

function OriginalFacts({ part }: { part: PartDto }) {
  const family = FAMILIES[part.family];
  const layout = pinLayoutFor(part.pinLayout);
  const facts = keyFacts(part);
  return (
    <header className="flex flex-col gap-4 border-b border-rule pb-5">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link to={`/parts/${part.id}`} className="font-semibold text-copper-deep underline-offset-2 hover:underline">
          ← {part.partNumber}
        </Link>
      </nav>
      <div className="flex flex-col gap-1.5">
        <p className="text-xs font-semibold tracking-wider text-copper-deep uppercase">{family.label} substitutes</p>
        <h1 className="text-3xl font-bold tracking-tight break-words text-ink">Alternates for {part.partNumber}</h1>
        <p className="text-ink-soft">{part.manufacturer.name}</p>
        <div className="mt-1 flex flex-wrap items-center gap-2">
          <LifecycleBadge lifecycle={part.lifecycle} />
          <RohsBadge status={part.rohsStatus} />
          {part.package && <span className="text-sm text-ink-soft">{packageLabel(part.package)}</span>}
          {layout && <span className="text-sm text-ink-soft">· {layout.label}</span>}
        </div>
        {part.lifecycle !== 'active' && (
          <p className="max-w-prose text-sm text-ink">
            {part.lifecycle === 'obsolete'
              ? 'This part is no longer made. The ranking below weighs each candidate against its figures.'
              : 'This part is on its way out. The ranking below weighs each candidate against its figures.'}
          </p>
        )}
      </div>
      {facts.length > 0 && (
        <dl aria-label={`Key figures of ${part.partNumber}`} className="grid grid-cols-2 gap-x-6 gap-y-2 text-sm sm:grid-cols-3 lg:grid-cols-6">
          {facts.map(({ def, text, qualifier }) => (
            <div key={def.key} className="flex flex-col">
              <dt className="text-xs text-ink-faint">{def.label}</dt>
              <dd className="font-semibold text-ink tabular-nums">
                {text}
                {qualifier && <span className="ml-1 text-[0.6875rem] font-semibold text-ink-faint uppercase">{qualifier}</span>}
              </dd>
            </div>
          ))}
        </dl>
      )}
    </header>
  );
}

function SupplyField({ initial, onValid }: { initial: string; onValid: (text: string | undefined) => void }) {
  const id = useId();
  const [text, setText] = useState(initial);
  const trimmed = text.trim();
  const parsed = trimmed === '' ? null : parseSupplySpan(trimmed, { unit: 'V' });
  const error = parsed && !parsed.ok ? parsed.error : undefined;
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="text-sm font-semibold text-ink">
        Operating supply
      </label>
      <input
        id={id}
        value={text}
        onChange={(event) => {
          const next = event.target.value;
          setText(next);
          const t = next.trim();
          if (t === '') onValid(undefined);
          else if (parseSupplySpan(t, { unit: 'V' }).ok) onValid(t);
        }}
        placeholder="9, ±15 V, 9 to 18 V"
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-note`}
        autoComplete="off"
        className={cx(
          'block h-10 w-full rounded-md border bg-card px-3 text-ink placeholder:text-ink-faint hover:border-ink-soft',
          error ? 'border-danger' : 'border-rule-strong',
        )}
      />
      <p id={`${id}-note`} className={cx('text-xs', error ? 'font-medium text-danger' : 'text-ink-soft')}>
        {error ??
          (parsed?.ok
            ? `Candidates must run on ${parsed.min === parsed.max ? `${parsed.max} V` : `${parsed.min} V to ${parsed.max} V`} between the rails.`
            : 'The supply the circuit has; a dual ±15 V supply is 30 V between the rails.')}
      </p>
    </div>
  );
}

function Toggle({ label, hint, checked, onChange }: { label: string; hint: string; checked: boolean; onChange: (v: boolean) => void }) {
  const id = useId();
  return (
    <div className="flex items-start gap-2.5">
      <input id={id} type="checkbox" checked={checked} onChange={(e) => onChange(e.target.checked)} aria-describedby={`${id}-hint`} className="mt-0.5 size-4 accent-copper" />
      <div className="flex flex-col">
        <label htmlFor={id} className="text-sm font-semibold text-ink">
          {label}
        </label>
        <span id={`${id}-hint`} className="text-xs text-ink-soft">
          {hint}
        </span>
      </div>
    </div>
  );
}

/**
 * Ranked stand-ins for one part. The controls live in the address; moving one re-asks the server after a short
 * pause while the last ranking stays on screen, so the order changes in place instead of flashing.
 */
export function AlternatesPage({ partId }: { partId: string }) {
  const part = usePart(partId);
  const { params, update } = useAlternatesParams();
  const [selected, setSelected] = useState<string[]>([]);
  // Bumped when the chart sets the supply, so the field starts again from the address.
  const [supplyFieldKey, setSupplyFieldKey] = useState(0);
  const family = part.data?.family;
  const weightsRead = family ? weightsFromParam(params.weights ?? null, family) : undefined;
  // The address catches up a moment after a slider moves; meanwhile the sliders show where the hand put them.
  const [draft, setDraft] = useState<{ written: ReadonlySet<string | undefined>; last: string | undefined; weights: Weights } | null>(null);
  const draftShown = draft !== null && draft.written.has(params.weights) && draft.last !== params.weights;
  const weights = draftShown ? draft.weights : weightsRead?.weights;
  // A garbled weights link falls back to the defaults rather than failing the page.
  const sentWeights = weightsRead?.error ? undefined : params.weights;
  const queryText = new URLSearchParams(
    alternatesApiQuery({
      weights: sentWeights,
      supply: params.supply,
      requireDropIn: params.requireDropIn,
      allowObsolete: params.allowObsolete,
      pairedWith: params.pairedWith,
      limit: params.limit,
    }),
  ).toString();
  // Debounce the text, not an object: a fresh object each render would restart the timer for ever.
  const debouncedText = useDebouncedValue(queryText, RERANK_DEBOUNCE_MS);
  const alternates = useAlternates(partId, Object.fromEntries(new URLSearchParams(debouncedText)), {
    // Weights in a link are checked against the family first.
    enabled: !params.weights || !!family,
  });
  const rulings = useEquivalents(partId);

  // The shared loading / no-such-part / error states; the page itself needs the part's data below.
  if (!part.isSuccess) return <PartQueryState query={part}>{() => null}</PartQueryState>;

  const original = part.data;
  const data = alternates.data;
  const items = data?.items ?? [];
  const settling = alternates.isFetching || queryText !== debouncedText;
  const supplyRange = params.supply ? parseSupplySpan(params.supply, { unit: 'V' }) : undefined;
  const supplySpan = supplyRange?.ok ? { min: supplyRange.min, max: supplyRange.max } : undefined;
  const compareIds = [original.id, ...selected];
  const pairs = data?.pairs ?? null;
  const anyCadmium =
    containsCadmium(original.parameters) ||
    items.some((i) => containsCadmium(i.part.parameters)) ||
    !!pairs?.items.some((p) => containsCadmium(p.cell.parameters));

  function setWeight(key: string, value: number) {
    if (!weights || !family) return;
    const next: Weights = { ...weights, [key]: value };
    const param = weightsParam(next, family);
    // Only addresses this page wrote count as catching up; any other (back, a pasted link) wins at once.
    const written = new Set(draftShown ? draft.written : [params.weights]);
    written.add(param);
    setDraft({ written, last: param, weights: next });
    update({ weights: param });
  }

  function resetWeights() {
    setDraft(null);
    update({ weights: undefined });
  }

  const originalSupply = supplySpanOf(original);
  const series: SupplyRangeSeries[] = originalSupply
    ? [
        { id: original.id, label: `${original.partNumber} (original)`, ...originalSupply },
        ...items.map((i) => ({ id: i.part.id, label: i.part.partNumber, ...supplySpanOf(i.part) })),
      ]
    : [];

  return (
    <div className="flex flex-col gap-6">
      <title>{`Alternates for ${original.partNumber} · Understudy`}</title>
      <OriginalFacts part={original} />
      {anyCadmium && <CadmiumCaution />}

      {/* On a phone the weights follow the results, so the ranking is not thirteen sliders away. */}
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,16rem)_minmax(0,1fr)] lg:grid-rows-[auto_1fr]">
        <div className="flex min-w-0 flex-col gap-6 lg:col-start-1 lg:row-start-1">
          <Card aria-labelledby="controls-title">
            <SectionHeading id="controls-title">Position</SectionHeading>
            <div className="flex flex-col gap-4 px-5 py-4">
              {FAMILIES[original.family].parameters.some((d) => d.key === 'supplyVoltage') && (
                <SupplyField key={supplyFieldKey} initial={params.supply ?? ''} onValid={(supply) => update({ supply })} />
              )}
              <Toggle
                label="Drop-in only"
                hint={`Only parts whose pins match: “${PINOUT_CLASS_LABELS['drop-in']}”.`}
                checked={params.requireDropIn}
                onChange={(v) => update({ requireDropIn: v })}
              />
              <Toggle
                label="Include obsolete"
                hint="Also rank parts that are no longer made, e.g. for a repair from stock."
                checked={params.allowObsolete}
                onChange={(v) => update({ allowObsolete: v })}
              />
              {original.family === 'photoresistor' && (
                <PartPicker
                  label="Paired LED"
                  family="led"
                  value={params.pairedWith ?? null}
                  onChange={(led) => update({ pairedWith: led?.id })}
                  hint="The LED that lights the cell, so spectral peaks can be compared."
                />
              )}
            </div>
          </Card>
        </div>
        {weights && family && (
          <div className="min-w-0 max-lg:order-last lg:col-start-1 lg:row-start-2">
            <WeightsPanel
              family={family}
              weights={weights}
              onChange={setWeight}
              onReset={resetWeights}
              isDefault={isDefaultWeights(weights, family)}
              error={weightsRead?.error}
            />
          </div>
        )}

        <div className="flex min-w-0 flex-col gap-6 lg:col-start-2 lg:row-span-2 lg:row-start-1">
          <Card aria-labelledby="results-title">
            <SectionHeading
              id="results-title"
              aside={
                <span className="flex items-center gap-3">
                  {settling && data && <Spinner className="text-copper" />}
                  <Link
                    to={`/compare?ids=${compareIds.join(',')}`}
                    aria-disabled={selected.length === 0 || undefined}
                    onClick={(event) => {
                      if (selected.length === 0) event.preventDefault();
                    }}
                    className={buttonClasses('secondary', 'sm', selected.length === 0 ? 'pointer-events-none opacity-60' : undefined)}
                  >
                    Compare ({selected.length})
                  </Link>
                </span>
              }
            >
              Ranked alternates
            </SectionHeading>
            {data && (
              <p className="px-5 pt-3 text-sm text-ink-soft" role="status">
                {items.length === 0
                  ? `None of the ${data.considered} ${FAMILIES[original.family].pluralLabel.toLowerCase()} considered qualifies.`
                  : `Best ${items.length} of ${data.considered} considered, scored out of 100. Approved equivalents come first. Tick up to ${MAX_COMPARE - 1} to compare with ${original.partNumber}.`}
              </p>
            )}
            <div className="py-3">
              {alternates.isPending && !data ? (
                <LoadingState label="Ranking alternates…" />
              ) : alternates.isError && !data ? (
                <div className="px-5">
                  <ErrorState title="The ranking could not be made" message={alternates.error.message} onRetry={() => void alternates.refetch()} />
                </div>
              ) : items.length === 0 ? (
                <div className="px-5">
                  <EmptyState
                    title="No alternates found"
                    action={
                      <span className="flex flex-wrap justify-center gap-2">
                        {params.requireDropIn && (
                          <Button variant="secondary" size="sm" onClick={() => update({ requireDropIn: false })}>
                            Allow other pinouts
                          </Button>
                        )}
                        {!params.allowObsolete && (
                          <Button variant="secondary" size="sm" onClick={() => update({ allowObsolete: true })}>
                            Include obsolete parts
                          </Button>
                        )}
                      </span>
                    }
                  >
                    Nothing in the catalog passes the position’s limits. The parts ruled out are listed with their reasons.
                  </EmptyState>
                </div>
              ) : (
                <>
                  {alternates.isError && (
                    <p role="alert" className="mx-5 mb-3 rounded-md border border-danger/30 bg-danger-wash px-3 py-2 text-sm text-danger">
                      {alternates.error.message} The ranking shown is from before the change.
                    </p>
                  )}
                  <AlternatesTable
                    original={original}
                    items={items}
                    busy={settling}
                    isSelected={(id) => selected.includes(id)}
                    selectionFull={selected.length >= MAX_COMPARE - 1}
                    onToggle={(id) => setSelected((s) => (s.includes(id) ? s.filter((x) => x !== id) : [...s, id]))}
                  />
                  {items.length >= params.limit && params.limit < MAX_LIMIT && (
                    <div className="border-t border-rule px-5 pt-3">
                      <Button variant="ghost" size="sm" onClick={() => update({ limit: Math.min(MAX_LIMIT, params.limit + LIMIT_STEP) })}>
                        Show {LIMIT_STEP} more
                      </Button>
                    </div>
                  )}
                </>
              )}
            </div>
          </Card>

          {pairs && (
            <PairsSection
              original={original}
              pairs={pairs}
              busy={settling}
              emptyAction={
                // Once is enough: with no ranked alternates either, their empty state offers the same.
                params.requireDropIn && items.length > 0 ? (
                  <Button variant="secondary" size="sm" onClick={() => update({ requireDropIn: false })}>
                    Allow other pinouts
                  </Button>
                ) : undefined
              }
            />
          )}

          {series.length > 1 && (
            <Card className="px-5 py-4">
              <SupplyRangeChart
                title="Supply range of the candidates"
                series={series}
                marker={undefined}
                markerSpan={supplySpan}
                onMarkerChange={(v) => {
                  update({ supply: `${v} V` });
                  setSupplyFieldKey((k) => k + 1);
                }}
              />
            </Card>
          )}

          {data && (
            <UnsuitableList
              items={data.unsuitable}
              rulingOf={(id) => rulingFor(rulings.data, original.id, id)}
            />
          )}

          {(original.family === 'photoresistor' || original.family === 'led') && (
            <OptocouplerPanel
              // A newly paired LED starts the estimate again from the pair.
              key={params.pairedWith ?? 'unpaired'}
              initialCell={original.family === 'photoresistor' ? original : null}
              initialLed={original.family === 'led' ? original : (params.pairedWith ?? null)}
              cadmiumShownAbove={anyCadmium}
            />
          )}
        </div>
      </div>
    </div>
  );
}
