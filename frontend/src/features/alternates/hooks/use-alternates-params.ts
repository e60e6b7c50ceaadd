import { useCallback } from 'react';
import { useSearchParams } from 'react-router';

export const DEFAULT_LIMIT = 10;
export const LIMIT_STEP = 10;
export const MAX_LIMIT = 50;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const flag = (v: string | null) => v === '1' || v === 'true';

/** The page's controls as they stand in the address, so a link reproduces the ranking. */
export interface AlternatesParams {
  /** `criterion:weight` pairs as formatWeights writes them; absent for the family's defaults. */
  weights?: string;
  supply?: string;
  requireDropIn: boolean;
  allowObsolete: boolean;
  pairedWith?: string;
  limit: number;
}

export function readAlternatesParams(params: URLSearchParams): AlternatesParams {
  const limit = Number(params.get('limit'));
  const pairedWith = params.get('pairedWith') ?? '';
  return {
    weights: params.get('weights') || undefined,
    supply: params.get('supply')?.trim() || undefined,
    requireDropIn: flag(params.get('requireDropIn')),
    allowObsolete: flag(params.get('allowObsolete')),
    pairedWith: UUID.test(pairedWith) ? pairedWith : undefined,
    limit: Number.isInteger(limit) && limit >= 1 ? Math.min(limit, MAX_LIMIT) : DEFAULT_LIMIT,
  };
}

export function useAlternatesParams() {
  const [params, setParams] = useSearchParams();
  const current = readAlternatesParams(params);

  // Replace, not push: a slider dragged through five steps should not leave five entries in the history.
  const update = useCallback(
    (changes: Partial<AlternatesParams>) => {
      setParams(
        (prev) => {
          const next = new URLSearchParams(prev);
          for (const [key, value] of Object.entries(changes)) {
            if (value === undefined || value === false || value === '' || (key === 'limit' && value === DEFAULT_LIMIT)) next.delete(key);
            else next.set(key, value === true ? '1' : String(value));
          }
          return next;
        },
        { replace: true, preventScrollReset: true },
      );
    },
    [setParams],
  );

  return { params: current, update };
}
