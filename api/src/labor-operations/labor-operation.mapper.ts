import { lbFtToNm } from '@swapwright/shared';
import { LaborOperationResponseDto, TorqueSpecResponseDto } from './dto/labor-operation.dto';
import { LaborOperation, TorqueSpec } from './labor-operation.entity';

/** N·m shown to a tenth (the figures on a torque wrench). */
export function mapTorqueSpec(spec: TorqueSpec): TorqueSpecResponseDto {
  return { joint: spec.joint ?? null, fastener: spec.fastener, lbfFt: spec.lbfFt, newtonMetres: Math.round(lbFtToNm(spec.lbfFt) * 10) / 10, sequence: spec.sequence };
}

export function mapLaborOperation(operation: LaborOperation): LaborOperationResponseDto {
  return {
    id: operation.id,
    code: operation.code,
    name: operation.name,
    bookHours: operation.bookHours,
    buildOrder: operation.buildOrder,
    matches: operation.matches,
    hazards: operation.hazards,
    torqueSpecs: operation.torqueSpecs.map(mapTorqueSpec),
    checks: operation.checks,
    updatedAt: operation.updatedAt.toISOString(),
  };
}
