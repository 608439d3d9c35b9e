import { AuditEvent } from './audit-event.entity';
import { AuditEventResponseDto } from './dto/audit-event.dto';

export function mapAuditEvent(event: AuditEvent): AuditEventResponseDto {
  return {
    id: event.id,
    kind: event.kind,
    action: event.action,
    actorUserId: event.actorUserId,
    actorName: event.actorName,
    subjectId: event.subjectId,
    summary: event.summary,
    before: event.before,
    after: event.after,
    createdAt: event.createdAt.toISOString(),
  };
}
