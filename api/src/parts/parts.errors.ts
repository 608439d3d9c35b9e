import { AppError } from '../common/errors/app-error';

export const PartsErrors = {
  partNotFound: () => new AppError(404, 'part_not_found', "That part does not exist in your shop's catalog."),
  supplierNotFound: () => new AppError(404, 'supplier_not_found', 'That supplier does not exist in your shop.'),
  skuTaken: (sku: string) => new AppError(409, 'sku_taken', `SKU ${sku} is already in your catalog; change that part or pick another SKU.`),
  supplierTaken: (name: string) => new AppError(409, 'supplier_taken', `A supplier named ${name} already exists.`),
  badAttributes: (key: string) =>
    new AppError(400, 'validation_failed', `attributes.${key} must be text, a number, true/false or a list of text`, [
      `attributes.${key} must be text, a number, true/false or a list of text`,
    ]),
  fitSpecIncomplete: () =>
    new AppError(400, 'validation_failed', 'fitKind and fitSpecId go together: give both or neither', ['fitKind and fitSpecId go together: give both or neither']),
  fitSpecMissing: (kind: string) => new AppError(400, 'bad_reference', `The linked fit spec is not in your shop's ${kind} catalog.`),
  fitReportNotOfProject: () =>
    new AppError(400, 'validation_failed', 'fitReportId must be a fit report of this project; leave it out to plan from a new fit check.', [
      'fitReportId must be a fit report of this project',
    ]),
  planNotFound: () => new AppError(404, 'parts_plan_not_found', 'That parts plan does not exist in your shop.'),
  planLocked: (version: number) => new AppError(409, 'parts_plan_locked', `Plan version ${version} is locked for a quote; build a new version to change it.`),
  lineNotFound: () => new AppError(404, 'counter_line_not_found', 'That parts line does not exist in your shop.'),
  outOfStock: (sku: string, available: number, wanted: number) =>
    new AppError(
      409,
      'out_of_stock',
      available === 0
        ? `No ${sku} is left to reserve: another job took the last one. Mark the line to order, or reserve from another location.`
        : `Only ${available} of ${sku} left to reserve, ${wanted} wanted. Reserve fewer or mark the line to order.`,
    ),
  lineState: (sku: string, status: string, action: string) =>
    new AppError(409, 'counter_line_state', `The ${sku} line is ${status}; it cannot be ${action} now. Refresh to see its current state.`),
  lineIssued: (sku: string) =>
    new AppError(
      409,
      'counter_line_issued',
      `The ${sku} line was issued to the job: its parts left the shelf, so it cannot be released. If a part came back unused, return it to the shelf.`,
    ),
  notSetAside: (sku: string, status: string) =>
    new AppError(409, 'counter_line_not_set_aside', `The ${sku} line is ${status}, not set aside: reserve it (or receive it) before issuing it to the job.`),
  nothingToIssue: () => new AppError(409, 'nothing_to_issue', 'Nothing on this parts list is set aside: reserve or receive the parts before issuing them to the job.'),
  notIssued: (sku: string, status: string) => new AppError(409, 'counter_line_not_issued', `The ${sku} line is ${status}, not issued: only parts issued to the job can come back to the shelf.`),
  noWorkOrder: () =>
    new AppError(409, 'no_work_order', "This job has no work order in progress: parts are issued to a job once its deposit has opened the work order, and not after it is finished."),
  noStockLocation: (sku: string) => new AppError(409, 'no_stock_location', `${sku} has no stock location yet; receive it into a location first.`),
};
