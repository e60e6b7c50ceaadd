import { VALUE_SLOTS, type FamilyDefinition, type ParameterDefinition, type PartDto } from '@understudy/shared-types';
import { formatConditions, formatParameterNumber, slotsOf, summarizeParameter } from '../../../lib/part-display';

function NumberRow({ def, part }: { def: ParameterDefinition; part: PartDto }) {
  const value = part.parameters[def.key];
  const allowed = slotsOf(def);
  return (
    <tr className="border-b border-rule last:border-b-0" data-parameter={def.key}>
      <th scope="row" className="px-4 py-2 text-left font-medium text-ink">
        <span className="block">{def.label}</span>
        <span className="block text-xs font-normal text-ink-faint">{def.description}</span>
      </th>
      {VALUE_SLOTS.map((slot) => {
        const v = value?.[slot];
        return (
          <td key={slot} data-slot={slot} className="px-3 py-2 text-right whitespace-nowrap tabular-nums">
            {v !== undefined ? (
              <span className="text-ink">{formatParameterNumber(def, v)}</span>
            ) : allowed.includes(slot) ? (
              <span className="text-ink-faint" aria-label="not given">—</span>
            ) : null}
          </td>
        );
      })}
      <td className="px-4 py-2 text-xs text-ink-soft">{formatConditions(value?.conditions)}</td>
    </tr>
  );
}

function ValueRow({ def, part }: { def: ParameterDefinition; part: PartDto }) {
  const summary = summarizeParameter(def, part.parameters[def.key]);
  return (
    <tr className="border-b border-rule last:border-b-0" data-parameter={def.key}>
      <th scope="row" className="px-4 py-2 text-left font-medium text-ink">
        <span className="block">{def.label}</span>
        <span className="block text-xs font-normal text-ink-faint">{def.description}</span>
      </th>
      <td colSpan={4} className="px-3 py-2 text-ink">
        {summary ? summary.text : <span className="text-ink-faint">not given</span>}
      </td>
    </tr>
  );
}

function Group({ title, rows, part, numeric }: { title: string; rows: ParameterDefinition[]; part: PartDto; numeric: boolean }) {
  if (rows.length === 0) return null;
  return (
    <tbody>
      <tr className="bg-paper-deep/60">
        <th colSpan={5} scope="rowgroup" className="px-4 py-1.5 text-left text-xs font-semibold tracking-wider text-ink-soft uppercase">
          {title}
        </th>
      </tr>
      {rows.map((def) => (numeric ? <NumberRow key={def.key} def={def} part={part} /> : <ValueRow key={def.key} def={def} part={part} />))}
    </tbody>
  );
}

/**
 * The datasheet figures: measured values with min / typ / max and their test conditions, then the kind of part
 * and its features. Parameters the part does not state are listed apart, so a gap is visible rather than hidden.
 */
export function ParameterTable({ family, part }: { family: FamilyDefinition; part: PartDto }) {
  const given = family.parameters.filter((p) => part.parameters[p.key] !== undefined);
  const missing = family.parameters.filter((p) => part.parameters[p.key] === undefined);
  const numbers = given.filter((p) => p.kind === 'number');
  const others = given.filter((p) => p.kind !== 'number');

  return (
    <div className="flex flex-col">
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Parameters of {part.partNumber}</caption>
          <thead>
            <tr className="border-b border-rule-strong">
              <th scope="col" className="px-4 py-2 text-left text-xs font-semibold text-ink-soft">
                Parameter
              </th>
              <th scope="col" className="px-3 py-2 text-right text-xs font-semibold text-ink-soft">
                Min
              </th>
              <th scope="col" className="px-3 py-2 text-right text-xs font-semibold text-ink-soft">
                Typ
              </th>
              <th scope="col" className="px-3 py-2 text-right text-xs font-semibold text-ink-soft">
                Max
              </th>
              <th scope="col" className="px-4 py-2 text-left text-xs font-semibold text-ink-soft">
                Conditions
              </th>
            </tr>
          </thead>
          <Group title="Characteristics" rows={numbers} part={part} numeric />
          <Group title="Type and features" rows={others} part={part} numeric={false} />
        </table>
      </div>
      {given.length === 0 && <p className="px-4 py-3 text-sm text-ink-soft">No parameters are recorded for this part yet.</p>}
      {missing.length > 0 && (
        <p className="border-t border-rule px-4 py-3 text-xs text-ink-faint">
          Not stated: {missing.map((p) => p.label).join(', ')}.
        </p>
      )}
    </div>
  );
}
