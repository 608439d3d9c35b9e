import { CreateAuditEvents1796257768745 } from './migrations/1796257768745-create-audit-events';
import { CreateJobs1796269160589 } from './migrations/1796269160589-create-jobs';
import { WorkOrderCheckPhotos1796270000000 } from './migrations/1796270000000-work-order-check-photos';
import { JobSubjects1796280000000 } from './migrations/1796280000000-job-subjects';
import { CounterLinesIssued1796290000000 } from './migrations/1796290000000-counter-lines-issued';
import { MeasurementValueVersions1796300000000 } from './migrations/1796300000000-measurement-value-versions';
import { ShopTimeZone1796310000000 } from './migrations/1796310000000-shop-time-zone';
import { CreateMeasurements1796240364406 } from './migrations/1796240364406-create-measurements';
import { CreateUsers1796100000000 } from './migrations/1796100000000-create-users';
import { CreateShops1796100001000 } from './migrations/1796100001000-create-shops';
import { CreateCustomers1796100002000 } from './migrations/1796100002000-create-customers';
import { CreateMemberships1796100003000 } from './migrations/1796100003000-create-memberships';
import { CreateInvitations1796100003500 } from './migrations/1796100003500-create-invitations';
import { CreateAuthTokens1796100004000 } from './migrations/1796100004000-create-auth-tokens';
import { CreateProjects1796100005000 } from './migrations/1796100005000-create-projects';
import { CreateCatalog1796100010000 } from './migrations/1796100010000-create-catalog';
import { CreateFitReports1796100011000 } from './migrations/1796100011000-create-fit-reports';
import { CreateCatalogBelts1796100012000 } from './migrations/1796100012000-create-catalog-belts';
import { FitSelectionsMountAdapter1796100013000 } from './migrations/1796100013000-fit-selections-mount-adapter';
import { SessionRevocation1796235495169 } from './migrations/1796235495169-session-revocation';
import { CreateParts1796236436524 } from './migrations/1796236436524-create-parts';
import { CreateQuotes1796236709687 } from './migrations/1796236709687-create-quotes';
import { CreateDepositPayments1796239097244 } from './migrations/1796239097244-create-deposit-payments';
import { PendingSignUps1796239565848 } from './migrations/1796239565848-pending-sign-ups';
import { PartsPlansFitReport1796252953356 } from './migrations/1796252953356-parts-plans-fit-report';
import { ThrottleCounters1796256137273 } from './migrations/1796256137273-throttle-counters';
import { ProjectStages1796257248657 } from './migrations/1796257248657-project-stages';
import { CreateWorkOrders1796257248658 } from './migrations/1796257248658-create-work-orders';

/** Every migration in the order it runs. A new feature module appends its own (one per module, hand-reviewed). */
export const MIGRATIONS = [
  CreateUsers1796100000000,
  CreateShops1796100001000,
  CreateCustomers1796100002000,
  CreateMemberships1796100003000,
  CreateInvitations1796100003500,
  CreateAuthTokens1796100004000,
  CreateProjects1796100005000,
  CreateCatalog1796100010000,
  CreateFitReports1796100011000,
  CreateCatalogBelts1796100012000,
  FitSelectionsMountAdapter1796100013000,
  SessionRevocation1796235495169,
  CreateParts1796236436524,
  CreateQuotes1796236709687,
  CreateDepositPayments1796239097244,
  PendingSignUps1796239565848,
  CreateMeasurements1796240364406,
  PartsPlansFitReport1796252953356,
  ThrottleCounters1796256137273,
  ProjectStages1796257248657,
  CreateWorkOrders1796257248658,
  CreateAuditEvents1796257768745,
  CreateJobs1796269160589,
  WorkOrderCheckPhotos1796270000000,
  JobSubjects1796280000000,
  CounterLinesIssued1796290000000,
  MeasurementValueVersions1796300000000,
  ShopTimeZone1796310000000,
];
