import { AuditEvent } from '../audit/audit-event.entity';
import { MEASUREMENT_ENTITIES } from '../measurements/measurement-sheet.entity';
import { RefreshToken } from '../auth/refresh-token.entity';
import { CATALOG_ENTITIES } from '../catalog/catalog-item.entity';
import { PasswordResetToken } from '../auth/password-reset-token.entity';
import { PendingSignUp } from '../auth/pending-sign-up.entity';
import { Customer } from '../customers/customer.entity';
import { FitReportRecord } from '../fit-reports/fit-report-record.entity';
import { ProjectFitSelection } from '../fit-reports/project-fit-selection.entity';
import { ShopFitSettings } from '../fit-reports/shop-fit-settings.entity';
import { Invitation } from '../invitations/invitation.entity';
import { Job } from '../jobs/job.entity';
import { LaborOperation } from '../labor-operations/labor-operation.entity';
import { QuoteNotification } from '../quotes/quote-notification.entity';
import { QuoteRevision } from '../quotes/quote-revision.entity';
import { QuoteSettings } from '../quotes/quote-settings.entity';
import { Quote } from '../quotes/quote.entity';
import { Membership } from '../memberships/membership.entity';
import { PARTS_ENTITIES } from '../parts/part.entity';
import { DepositPayment, PaymentEvent } from '../payments/deposit-payment.entity';
import { Project } from '../projects/project.entity';
import { ThrottleCounter } from '../rate-limits/throttle-counter.entity';
import { Shop } from '../shops/shop.entity';
import { User } from '../users/user.entity';
import { WorkOrder, WorkOrderCheck, WorkOrderCheckPhoto } from '../work-orders/work-order.entity';

/** Every entity, listed explicitly (no globs: the same list works from src under jest and from dist). */
export const ENTITIES = [User, Shop, Membership, Invitation, RefreshToken, PasswordResetToken, PendingSignUp, Customer, Project,
  ...CATALOG_ENTITIES, ProjectFitSelection, ShopFitSettings, FitReportRecord, ...PARTS_ENTITIES,
  LaborOperation, Quote, QuoteRevision, QuoteSettings, QuoteNotification, DepositPayment, PaymentEvent, ...MEASUREMENT_ENTITIES,
  ThrottleCounter, WorkOrder, WorkOrderCheck, WorkOrderCheckPhoto, AuditEvent, Job];
