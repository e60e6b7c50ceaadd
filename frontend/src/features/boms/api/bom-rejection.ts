import { BomRejectionDetailsSchema, type BomRejection } from '@understudy/shared-types';
import { z } from 'zod';
import { isApiClientError } from '../../../lib/api-client';

export type BomRejectionDetails = z.output<typeof BomRejectionDetailsSchema>;

const PayloadSchema = z.object({ details: BomRejectionDetailsSchema });

/** Why the server would not read the BOM at all (400/413 with `details`), or undefined for any other failure. */
export function bomRejectionOf(error: unknown): BomRejectionDetails | undefined {
  if (!isApiClientError(error) || (error.status !== 400 && error.status !== 413)) return undefined;
  const parsed = PayloadSchema.safeParse(error.payload);
  return parsed.success ? parsed.data.details : undefined;
}

export const BOM_REJECTION_TITLES: Record<BomRejection, string> = {
  empty: 'There is nothing to read',
  'too-large': 'The file is too large',
  'too-many-lines': 'There are too many lines',
  'too-many-columns': 'There are too many columns',
  unreadable: 'The text could not be read',
  'no-part-number-column': 'No column holds the part numbers',
  'no-part-numbers': 'No line has a part number',
};
