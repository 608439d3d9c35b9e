import type { QueryOf, RequestBodyOf, Schemas } from '@/lib/api-types';

export type WorkOrder = Schemas['WorkOrderResponseDto'];
export type WorkOrderSummary = Schemas['WorkOrderSummaryResponseDto'];
export type WorkStep = Schemas['WorkStepResponseDto'];
export type WorkCheck = Schemas['WorkCheckResponseDto'];
export type WorkOrderState = WorkOrder['state'];
export type WorkOrderListQuery = QueryOf<'/api/work-orders', 'get'>;
export type RecordCheckBody = RequestBodyOf<'/api/work-orders/{id}/checks', 'post'>;
