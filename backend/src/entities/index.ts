import { AuditEventEntity } from './AuditEvent';
import { InvitationEntity } from './Invitation';
import { PasswordResetEntity } from './PasswordReset';
import { UserEntity } from './User';

export * from './AuditEvent';
export * from './Invitation';
export * from './PasswordReset';
export * from './User';

export const ENTITIES = [UserEntity, InvitationEntity, PasswordResetEntity, AuditEventEntity];
