import type { PartDto } from '@understudy/shared-types';
import type { Part } from '../../entities';

export function presentPart(part: Part, manufacturerName: string): PartDto {
  return {
    id: part.id,
    family: part.family,
    manufacturer: { id: part.manufacturerId, name: manufacturerName },
    partNumber: part.partNumber,
    description: part.description,
    lifecycle: part.lifecycle,
    rohsStatus: part.rohsStatus,
    rohsNote: part.rohsNote,
    package: part.package,
    pinLayout: part.pinLayout,
    pinMap: part.pinMap,
    parameters: part.parameters,
    tags: part.tags,
    version: part.version,
    archived: part.archived,
    createdAt: new Date(part.createdAt).toISOString(),
    updatedAt: new Date(part.updatedAt).toISOString(),
  };
}

/** A raw SQL row (snake_case, as selected by the search query) → the entity shape. */
export function partFromRow(row: Record<string, unknown>): Part {
  return {
    id: row.id as string,
    family: row.family as Part['family'],
    manufacturerId: row.manufacturer_id as string,
    partNumber: row.part_number as string,
    partNumberKey: row.part_number_key as string,
    description: row.description as string,
    lifecycle: row.lifecycle as Part['lifecycle'],
    rohsStatus: row.rohs_status as Part['rohsStatus'],
    rohsNote: row.rohs_note as string,
    package: row.package as string,
    pinLayout: (row.pin_layout as string | null) ?? null,
    pinMap: row.pin_map as Part['pinMap'],
    parameters: row.parameters as Part['parameters'],
    tags: row.tags as string[],
    version: row.version as number,
    archived: row.archived as boolean,
    createdAt: row.created_at as Date,
    updatedAt: row.updated_at as Date,
  };
}
