import { AlertPreferenceEntity } from './AlertPreference';
import { AuditEventEntity } from './AuditEvent';
import { DatasheetEntity } from './Datasheet';
import { EquivalentEntity } from './Equivalent';
import { InvitationEntity } from './Invitation';
import { ManufacturerEntity } from './Manufacturer';
import { NotificationEntity } from './Notification';
import { PartEntity } from './Part';
import { PartChangeEntity } from './PartChange';
import { PartRevisionEntity } from './PartRevision';
import { PasswordResetEntity } from './PasswordReset';
import { RequirementSetEntity } from './RequirementSet';
import { UserEntity } from './User';

export * from './AlertPreference';
export * from './AuditEvent';
export * from './Datasheet';
export * from './Equivalent';
export * from './Invitation';
export * from './Manufacturer';
export * from './Notification';
export * from './Part';
export * from './PartChange';
export * from './PartRevision';
export * from './PasswordReset';
export * from './RequirementSet';
export * from './User';

export const ENTITIES = [UserEntity, InvitationEntity, PasswordResetEntity, AuditEventEntity, ManufacturerEntity, PartEntity, PartRevisionEntity, DatasheetEntity, EquivalentEntity, RequirementSetEntity, PartChangeEntity, NotificationEntity, AlertPreferenceEntity];
