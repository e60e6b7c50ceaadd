import type { BomDetailDto } from '@understudy/shared-types';
import { useId, useMemo, useState } from 'react';
import { useSearchParams } from 'react-router';
import { Card, RecordQueryState, SectionHeading } from '../../../components/ui';
import { useAppAbility } from '../../../lib/ability';
import { useDebouncedValue } from '../../../hooks/use-debounced-value';
import { NO_SUCH_BOM, useBom } from '../api/get-bom';
import { canChangeBom, ownsBom } from '../lib/access';
import { RISK_CATEGORIES, isRiskKey, lineMentions, plural, riskCategory, type RiskKey } from '../lib/lines';
import { BomHeader } from './bom-header';
import { BomLinesTable } from './bom-lines-table';
import { CheckHistory } from './check-history';
import { LineDetails } from './line-details';
import { RiskSummary } from './risk-summary';

function BomView({ bom }: { bom: BomDetailDto }) {
  const ability = useAppAbility();
  const canEdit = canChangeBom(ability, bom);
  const isOwner = ownsBom(ability, bom);
  const searchId = useId();
  const [params, setParams] = useSearchParams();
  const riskParam = params.get('risk');
  const risk: RiskKey | null = isRiskKey(riskParam) ? riskParam : null;
  const [search, setSearch] = useState('');
  const needle = useDebouncedValue(search, 200);

  const lines = useMemo(() => {
    const category = risk ? riskCategory(risk) : null;
    return bom.lines.filter((line) => (!category || category.matches(line)) && lineMentions(line, needle));
  }, [bom.lines, risk, needle]);

  function setRisk(next: RiskKey | null) {
    setParams(
      (current) => {
        const copy = new URLSearchParams(current);
        if (next) copy.set('risk', next);
        else copy.delete('risk');
        return copy;
      },
      { replace: true },
    );
  }

  const filterLabel = risk ? RISK_CATEGORIES.find((c) => c.key === risk)!.label : null;

  return (
    <div className="flex flex-col gap-6">
      <title>{`${bom.name} · BOMs · Understudy`}</title>
      <BomHeader bom={bom} canEdit={canEdit} isOwner={isOwner} />
      <RiskSummary summary={bom.summary} active={risk} onChange={setRisk} />

      <Card aria-labelledby="bom-lines-title">
        <SectionHeading
          id="bom-lines-title"
          aside={
            <div className="flex items-center gap-2">
              <label htmlFor={searchId} className="sr-only">
                Find in the lines
              </label>
              <input
                id={searchId}
                type="search"
                value={search}
                onChange={(event) => setSearch(event.target.value)}
                placeholder="Find a part or designator"
                autoComplete="off"
                className="block h-8 w-56 rounded-md border border-rule-strong bg-card px-3 text-sm text-ink placeholder:text-ink-faint hover:border-ink-soft"
              />
            </div>
          }
        >
          Lines{' '}
          <span className="text-sm font-normal text-ink-soft">
            {filterLabel || needle.trim()
              ? `${plural(lines.length, 'line')} of ${bom.lines.length.toLocaleString()}${filterLabel ? `: ${filterLabel}` : ''}`
              : `${plural(bom.lines.length, 'line')}, worst first`}
          </span>
        </SectionHeading>
        <BomLinesTable
          lines={lines}
          confirmedByYou={canEdit}
          resetKey={`${risk ?? ''}|${needle}`}
          caption={`Lines of ${bom.name}`}
          renderDetails={(line) => <LineDetails key={line.id} bomId={bom.id} line={line} canEdit={canEdit} />}
        />
      </Card>

      <CheckHistory checks={bom.checks} />
    </div>
  );
}

/** One saved BOM: its risks at a glance, every line with what may replace it, and its history of checks. */
export function BomPage({ bomId }: { bomId: string }) {
  const bom = useBom(bomId);
  return (
    <RecordQueryState query={bom} loadingLabel="Loading the BOM…" missing={NO_SUCH_BOM}>
      {(bom) => <BomView bom={bom} />}
    </RecordQueryState>
  );
}
