import { Role } from './role';

/**
 * Who may do what, inside their own shop. Routes use these groups in `@Roles(...)`;
 * a route without `@Roles` is open to every signed-in member; `@Public()` routes need no sign-in.
 *
 * | route group                          | owner | estimator | fabricator        | counter | customer   |
 * | ------------------------------------ | ----- | --------- | ----------------- | ------- | ---------- |
 * | GET /auth/me, GET /shops/current     | yes   | yes       | yes               | yes     | yes        |
 * | … its rates (labor, tax, supplies)   | yes   | yes       | yes               | yes     | -          |
 * | PATCH /shops/current                 | yes   | -         | -                 | -       | -          |
 * | /memberships, /invitations (manage)  | yes   | -         | -                 | -       | -          |
 * | GET /customers, /customers/:id       | yes   | yes       | yes               | yes     | -          |
 * | POST/PATCH/DELETE /customers         | yes   | yes       | -                 | -       | -          |
 * | GET /projects, /projects/:id         | yes   | yes       | yes               | yes     | own only   |
 * | POST /projects, DELETE /projects/:id | yes   | yes       | -                 | -       | -          |
 * | PATCH /projects/:id                  | yes   | yes       | placement, status | -       | -          |
 * | GET /catalog/<kind>[/:id]            | yes   | yes       | yes               | yes     | -          |
 * | POST/PATCH/DELETE /catalog/<kind>    | yes   | yes       | -                 | yes     | -          |
 * | POST /catalog/sample (start from it) | yes   | -         | -                 | -       | -          |
 * | GET /projects/:id/fit-selections     | yes   | yes       | yes               | yes     | -          |
 * | PUT /projects/:id/fit-selections     | yes   | yes       | yes               | -       | -          |
 * | POST /projects/:id/fit-reports       | yes   | yes       | yes               | -       | -          |
 * | GET fit reports (list, one, compare) | yes   | yes       | yes               | yes     | own only   |
 * | POST /fit-reports/what-if            | yes   | yes       | yes               | yes     | -          |
 * | GET /fit-settings                    | yes   | yes       | yes               | yes     | -          |
 * | PUT /fit-settings                    | yes   | -         | -                 | -       | -          |
 * | GET parts plans (project's, one)     | yes   | yes       | yes               | yes     | own (view) |
 * | GET /labor-operations                | yes   | yes       | yes               | yes     | -          |
 * | POST/PATCH/DELETE /labor-operations  | yes   | yes       | -                 | -       | -          |
 * | GET quotes (list, one, PDF, compare) | yes   | yes       | yes               | yes     | own, sent  |
 * | POST/PATCH quotes, send              | yes   | yes       | -                 | -       | -          |
 * | start own build (own truck's quote)  | yes   | yes       | -                 | -       | -          |
 * | answer a quote, pay its deposit      | -     | -         | -                 | -       | own only   |
 * | GET/PUT /quote-settings              | yes   | read      | -                 | -       | -          |
 * | GET work orders                      | yes   | yes       | yes               | -       | -          |
 * | record a work-order check            | yes   | yes       | yes               | -       | -          |
 * | add or remove a check photo          | yes   | yes       | yes               | -       | -          |
 * | GET measurement sheet, photo files   | yes   | yes       | yes               | yes     | own only   |
 * | PUT sheet values, sign-off, template | yes   | -         | yes               | -       | -          |
 * | POST sheet photos, DELETE own photo  | yes   | -         | yes               | -       | own project (pending) |
 * | GET template, measurement settings   | yes   | yes       | yes               | yes     | -          |
 * | PUT measurement-settings             | yes   | -         | -                 | -       | -          |
 * | GET /audit-events                    | yes   | -         | -                 | -       | -          |
 * | GET /jobs, retry a stopped job       | yes   | -         | -                 | -       | -          |
 */
export const ALL_ROLES: Role[] = ['owner', 'estimator', 'fabricator', 'counter', 'customer'];
export const SHOP_ADMINS: Role[] = ['owner'];
export const STAFF: Role[] = ['owner', 'estimator', 'fabricator', 'counter'];
/** Who sees the shop's rates in GET /shops/current; the others get only its name, units and currency. */
export const SHOP_RATE_READERS: Role[] = STAFF;
export const CUSTOMER_READERS: Role[] = STAFF;
export const CUSTOMER_WRITERS: Role[] = ['owner', 'estimator'];
export const PROJECT_READERS: Role[] = ALL_ROLES;
export const PROJECT_WRITERS: Role[] = ['owner', 'estimator'];
export const PROJECT_EDITORS: Role[] = ['owner', 'estimator', 'fabricator'];
/** Fields a fabricator may change on a project; the rest of a PATCH is refused for them. */
export const FABRICATOR_PROJECT_FIELDS = ['placement'] as const;
export const CATALOG_READERS: Role[] = STAFF;
export const CATALOG_WRITERS: Role[] = ['owner', 'estimator', 'counter'];
export const FIT_SELECTION_READERS: Role[] = STAFF;
export const FIT_SELECTION_WRITERS: Role[] = ['owner', 'estimator', 'fabricator'];
export const FIT_REPORT_RUNNERS: Role[] = ['owner', 'estimator', 'fabricator'];
/** Customers read the reports of their own projects only (the service scopes them). */
export const FIT_REPORT_READERS: Role[] = ALL_ROLES;
export const FIT_WHAT_IF_USERS: Role[] = STAFF;
export const FIT_SETTINGS_READERS: Role[] = STAFF;
export const FIT_SETTINGS_WRITERS: Role[] = SHOP_ADMINS;
/**
 * Customers read the plans of their own projects only (the service scopes them), as the customer's view: parts,
 * operations and totals at the plan's prices, without stock, candidates or solver figures.
 */
export const PARTS_PLAN_READERS: Role[] = ALL_ROLES;
export const LABOR_OPERATION_READERS: Role[] = STAFF;
export const LABOR_OPERATION_WRITERS: Role[] = ['owner', 'estimator'];
/** Customers read the sent revisions of quotes on their own projects (the service scopes them). */
export const QUOTE_READERS: Role[] = ALL_ROLES;
export const QUOTE_WRITERS: Role[] = ['owner', 'estimator'];
export const QUOTE_ANSWERERS: Role[] = ['customer'];
export const QUOTE_SETTINGS_READERS: Role[] = ['owner', 'estimator'];
export const QUOTE_SETTINGS_WRITERS: Role[] = SHOP_ADMINS;
export const WORK_ORDER_READERS: Role[] = ['owner', 'estimator', 'fabricator'];
export const WORK_ORDER_RECORDERS: Role[] = ['owner', 'estimator', 'fabricator'];
/** Check photos: the shop's members and the project's own customer (the service scopes a customer to their projects). */
export const WORK_ORDER_PHOTO_READERS: Role[] = ALL_ROLES;
export const MEASUREMENT_READERS: Role[] = STAFF;
export const MEASUREMENT_WRITERS: Role[] = ['owner', 'fabricator'];
/** Customers see the sheet and photos of their own projects only (the projects service scopes them). */
export const MEASUREMENT_PHOTO_READERS: Role[] = ALL_ROLES;
export const MEASUREMENT_PHOTO_ADDERS: Role[] = ['owner', 'fabricator', 'customer'];
export const MEASUREMENT_SETTINGS_WRITERS: Role[] = SHOP_ADMINS;
/** GET /audit-events: the shop's audit log of money, stock, sign-off and membership changes. */
export const AUDIT_READERS: Role[] = SHOP_ADMINS;
