import {
  DatasheetApplyBodySchema,
  FAMILIES,
  FAMILY_KEYS,
  PACKAGES,
  reviewedParameters,
  type DatasheetDto,
  type DatasheetExtraction,
  type FamilyKey,
  type PartDto,
} from '@understudy/shared-types';
import { useEffect, useId, useRef, useState } from 'react';
import { Link } from 'react-router';
import { Alert, Button, SelectField, TextField, cx } from '../../../components/ui';
import { isApiClientError } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import { packageLabel } from '../../../lib/part-display';
import { isApplyConflictError, useApplyDatasheet } from '../api/apply-datasheet';
import { useTargetPart } from '../api/get-target-part';
import { usePartSearch } from '../../../hooks/use-part-search';
import { useDebouncedValue } from '../../../hooks/use-debounced-value';
import { diffAgainst, type DiffLine } from '../lib/proposals';

type Target = 'existing' | 'new';
interface NewPartFields {
  family: string;
  partNumber: string;
  manufacturer: string;
  package: string;
  description: string;
}
type NewPartErrors = Partial<Record<keyof NewPartFields | '_form', string>>;

const LINK = 'font-semibold text-copper-deep underline-offset-2 hover:underline';

function plural(n: number, one: string, many = `${one}s`) {
  return `${n} ${n === 1 ? one : many}`;
}

function DiffTable({ lines, target }: { lines: DiffLine[]; target: string }) {
  return (
    <div className="overflow-x-auto rounded-md border border-rule">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">What applying changes on {target}</caption>
        <thead>
          <tr className="border-b border-rule bg-paper/60">
            {['Parameter', 'Now', 'After'].map((h) => (
              <th key={h} scope="col" className="px-3 py-2 text-xs font-semibold tracking-wider whitespace-nowrap text-ink-soft uppercase">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {lines.map((line) => (
            <tr key={line.key} className="border-b border-rule align-top last:border-b-0" data-parameter={line.key}>
              <th scope="row" className="px-3 py-2 font-semibold text-ink">
                {line.label}
              </th>
              <td className="px-3 py-2 break-words text-ink-soft">
                {line.changed ? <del className="decoration-danger/60">{line.before}</del> : line.before}
              </td>
              <td className={cx('px-3 py-2 break-words', line.changed ? 'text-ink' : 'text-ink-faint')}>
                {line.changed ? <ins className="no-underline">{line.after}</ins> : 'No change'}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function ChosenPart({ part, onChange }: { part: PartDto; onChange: () => void }) {
  return (
    <div className="flex flex-wrap items-center justify-between gap-3 rounded-md border border-rule bg-paper/50 px-3 py-2">
      <p className="text-sm">
        <Link to={`/parts/${part.id}`} className={LINK}>
          {part.partNumber}
        </Link>{' '}
        <span className="text-ink-soft">
          {part.manufacturer.name} · {FAMILIES[part.family].label}
          {part.package ? ` · ${packageLabel(part.package)}` : ''} · version {part.version}
        </span>
      </p>
      <Button variant="secondary" size="sm" onClick={onChange}>
        Choose another part
      </Button>
    </div>
  );
}

function PartPicker({ initialQuery, family, onPick }: { initialQuery: string; family: FamilyKey | undefined; onPick: (id: string) => void }) {
  const [q, setQ] = useState(initialQuery);
  const debounced = useDebouncedValue(q, 250);
  const search = usePartSearch(debounced, family);
  const name = useId();
  return (
    <div className="flex flex-col gap-3">
      <TextField
        label="Find the part"
        type="search"
        value={q}
        onValueChange={setQ}
        hint={family ? `Part number or words from the description, among ${FAMILIES[family].pluralLabel.toLowerCase()}.` : 'Part number or words from the description.'}
        autoComplete="off"
      />
      {debounced.trim() !== '' && (
        <fieldset className="flex flex-col gap-1">
          <legend className="sr-only">Matching parts</legend>
          {search.isPending && <p className="text-sm text-ink-soft">Searching…</p>}
          {search.isError && <p className="text-sm text-danger">{search.error.message}</p>}
          {search.data?.length === 0 && <p className="text-sm text-ink-soft">No part matches “{debounced.trim()}”. Create a new part instead?</p>}
          {search.data?.map((part) => (
            <label key={part.id} className="flex cursor-pointer items-center gap-2 rounded-md px-2 py-1.5 text-sm hover:bg-paper-deep">
              <input type="radio" name={name} className="accent-copper" onChange={() => onPick(part.id)} />
              <span>
                <span className="font-semibold text-ink">{part.partNumber}</span>{' '}
                <span className="text-ink-soft">
                  {part.manufacturer.name}
                  {part.package ? ` · ${packageLabel(part.package)}` : ''}
                  {part.archived ? ' · archived' : ''}
                </span>
              </span>
            </label>
          ))}
        </fieldset>
      )}
    </div>
  );
}

function initialFields(extraction: DatasheetExtraction): NewPartFields {
  const id = extraction.identity;
  return {
    family: id.family?.value ?? '',
    partNumber: id.partNumber?.value ?? '',
    manufacturer: id.manufacturer?.value ?? '',
    package: id.package?.value ?? '',
    description: '',
  };
}

function serverFieldErrors(error: unknown): NewPartErrors {
  if (!isApiClientError(error)) return {};
  const out: NewPartErrors = {};
  for (const issue of error.issues) {
    const field = issue.path.replace(/^body\./, '').split('.')[0] as keyof NewPartFields;
    out[field] ??= issue.message;
  }
  return out;
}

/**
 * Writes the kept values into the catalog: into a chosen part (against the version shown, so a save made meanwhile
 * is not silently overwritten) or as a new part from the reviewed identity. The change is shown before it is made.
 */
export function ApplyPanel({ sheet, onApplied }: { sheet: DatasheetDto & { extraction: DatasheetExtraction }; onApplied?: (part: PartDto) => void }) {
  const extraction = sheet.extraction;
  const family = extraction.identity.family?.value;
  const [target, setTarget] = useState<Target>('existing');
  const [partId, setPartId] = useState<string | null>(sheet.part?.id ?? null);
  const [fields, setFields] = useState<NewPartFields>(() => initialFields(extraction));
  const [errors, setErrors] = useState<NewPartErrors>({});
  const apply = useApplyDatasheet();
  const targetPart = useTargetPart(target === 'existing' ? partId : null);
  const conflictRef = useRef<HTMLDivElement>(null);
  const radioName = useId();

  const reviewed = reviewedParameters(extraction.proposals);
  const count = Object.keys(reviewed).length;
  const pending = extraction.proposals.filter((p) => p.decision === 'pending').length;
  const part = target === 'existing' ? targetPart.data : undefined;
  const newFamily = (FAMILY_KEYS as readonly string[]).includes(fields.family) ? (fields.family as FamilyKey) : undefined;
  const lines = part ? diffAgainst(part.family, part.parameters, reviewed) : target === 'new' ? diffAgainst(newFamily ?? family, {}, reviewed) : [];
  const changed = lines.filter((l) => l.changed).length;
  const mismatch = !!part && !!family && part.family !== family;
  const conflict = isApplyConflictError(apply.error) ? apply.error : undefined;
  const fieldErrors = { ...serverFieldErrors(apply.error), ...errors };

  useEffect(() => {
    if (conflict) conflictRef.current?.focus();
  }, [conflict]);

  function choose(next: Target) {
    setTarget(next);
    apply.reset();
  }

  function pick(id: string | null) {
    setPartId(id);
    apply.reset();
  }

  function setField(key: keyof NewPartFields, value: string) {
    setFields((f) => ({ ...f, [key]: value }));
    setErrors((e) => ({ ...e, [key]: undefined }));
  }

  function submit() {
    if (target === 'existing') {
      if (!part) return;
      apply.mutate(
        { id: sheet.id, body: { target: 'existing', partId: part.id, version: part.version } },
        { onSuccess: ({ part: saved }) => onApplied?.(saved) },
      );
      return;
    }
    const parsed = DatasheetApplyBodySchema.safeParse({ target: 'new', ...fields });
    if (!parsed.success) {
      const next: NewPartErrors = {};
      for (const issue of parsed.error.issues) next[(String(issue.path[0] ?? '_form') as keyof NewPartErrors)] ??= issue.message;
      setErrors(next);
      return;
    }
    apply.mutate(
      { id: sheet.id, body: parsed.data },
      {
        onSuccess: ({ part: saved }) => {
          // The datasheet now belongs to the new part; a later apply goes to it.
          setTarget('existing');
          setPartId(saved.id);
          onApplied?.(saved);
        },
      },
    );
  }

  if (apply.isSuccess) {
    const saved = apply.data.part;
    return (
      <div className="flex flex-col gap-3 p-5">
        <Alert tone="success" title={`Applied to ${saved.partNumber}`}>
          {plural(count, 'value')} written; {saved.partNumber} is now at version {saved.version}, and its history names this datasheet.{' '}
          <Link to={`/parts/${saved.id}`} className={LINK}>
            Open {saved.partNumber}
          </Link>
        </Alert>
        <div>
          <Button variant="secondary" size="sm" onClick={() => apply.reset()}>
            Apply again
          </Button>
        </div>
      </div>
    );
  }

  const targetName = target === 'new' ? fields.partNumber.trim() || 'the new part' : (part?.partNumber ?? 'the part');
  const canSubmit = count > 0 && (target === 'new' || (!!part && !mismatch));

  return (
    <div className="flex flex-col gap-4 p-5">
      <fieldset className="flex flex-wrap gap-x-5 gap-y-2">
        <legend className="mb-2 text-sm font-semibold text-ink">Apply the kept values to</legend>
        <label className="flex items-center gap-2 text-sm">
          <input type="radio" name={radioName} checked={target === 'existing'} onChange={() => choose('existing')} className="accent-copper" />
          An existing part
        </label>
        <label className="flex items-center gap-2 text-sm">
          <input type="radio" name={radioName} checked={target === 'new'} onChange={() => choose('new')} className="accent-copper" />
          Create a new part
        </label>
      </fieldset>

      {target === 'existing' &&
        (partId ? (
          targetPart.isPending ? (
            <p className="text-sm text-ink-soft">Loading the part…</p>
          ) : targetPart.isError ? (
            <Alert tone="error" title="The part could not be loaded">
              {targetPart.error.message}{' '}
              <button type="button" className={LINK} onClick={() => pick(null)}>
                Choose another part
              </button>
            </Alert>
          ) : (
            <ChosenPart part={targetPart.data} onChange={() => pick(null)} />
          )
        ) : (
          <PartPicker initialQuery={extraction.identity.partNumber?.value ?? ''} family={family} onPick={pick} />
        ))}

      {target === 'new' && (
        <div className="grid gap-3 sm:grid-cols-2">
          <SelectField
            label="Family"
            value={fields.family}
            onValueChange={(v) => setField('family', v)}
            options={[{ value: '', label: 'Choose a family' }, ...FAMILY_KEYS.map((k) => ({ value: k, label: FAMILIES[k].label }))]}
            error={fieldErrors.family}
          />
          <TextField label="Part number" value={fields.partNumber} onValueChange={(v) => setField('partNumber', v)} error={fieldErrors.partNumber} />
          <TextField label="Manufacturer" value={fields.manufacturer} onValueChange={(v) => setField('manufacturer', v)} error={fieldErrors.manufacturer} />
          <TextField
            label="Package"
            value={fields.package}
            onValueChange={(v) => setField('package', v)}
            error={fieldErrors.package}
            list={`${radioName}-packages`}
          />
          <datalist id={`${radioName}-packages`}>
            {PACKAGES.filter((p) => !newFamily || (p.families as readonly string[]).includes(newFamily)).map((p) => (
              <option key={p.key} value={p.key}>
                {p.label}
              </option>
            ))}
          </datalist>
          <TextField
            label="Description"
            value={fields.description}
            onValueChange={(v) => setField('description', v)}
            error={fieldErrors.description}
            className="sm:col-span-2"
          />
          {newFamily && family && newFamily !== family && (
            <p className="text-sm text-warn sm:col-span-2">
              The values were read as {FAMILIES[family].label.toLowerCase()} parameters; a {FAMILIES[newFamily].label.toLowerCase()} may not take them.
            </p>
          )}
        </div>
      )}

      {mismatch && part && family && (
        <Alert tone="warning" title="Different family">
          This datasheet describes {FAMILIES[family].label.toLowerCase()} parameters, but {part.partNumber} is {FAMILIES[part.family].label.toLowerCase()}. Choose
          another part or create a new one.
        </Alert>
      )}

      {conflict && (
        <div ref={conflictRef} tabIndex={-1} className="outline-none" data-testid="apply-conflict">
          <Alert tone="warning" title={`Someone else saved ${conflict.current.partNumber} while you were reviewing`}>
            It is now version {conflict.current.version}, saved {formatDateTime(conflict.current.updatedAt)}. The changes below are against what
            is saved now; apply again if they still look right.
          </Alert>
        </div>
      )}

      {count === 0 ? (
        <p className="text-sm text-ink-soft">Accept or edit at least one proposed value; only those are applied.</p>
      ) : (
        lines.length > 0 && (
          <section aria-labelledby={`${radioName}-diff`} className="flex flex-col gap-2">
            <h3 id={`${radioName}-diff`} className="text-sm font-semibold text-ink">
              {target === 'new'
                ? `${targetName} will be created with ${plural(count, 'value')}`
                : `${plural(changed, 'value')} will change on ${targetName}`}
            </h3>
            <DiffTable lines={lines} target={targetName} />
          </section>
        )
      )}
      {pending > 0 && count > 0 && (
        <p className="text-xs text-ink-soft">{plural(pending, 'proposal is', 'proposals are')} still pending and will be left out.</p>
      )}

      {apply.isError && !conflict && (
        <Alert tone="error" title="Nothing was applied">
          {apply.error.message}
        </Alert>
      )}

      <div className="flex flex-wrap items-center gap-3">
        <Button onClick={submit} loading={apply.isPending} disabled={!canSubmit}>
          {target === 'new'
            ? `Create ${targetName}`
            : conflict && part
              ? `Apply against version ${part.version}`
              : `Apply to ${targetName}`}
        </Button>
      </div>
    </div>
  );
}
