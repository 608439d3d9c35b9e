import { AuthUser } from '../common/tenant/auth-user';
import { Customer } from './customer.entity';
import { CustomerResponseDto } from './dto/customer-response.dto';

/** Whether the customer record is the member's own (linked to their login): the record "My own truck" files under. */
export function isOwnCustomerRecord(customer: Pick<Customer, 'userId'>, viewer: Pick<AuthUser, 'userId'>): boolean {
  return customer.userId != null && customer.userId === viewer.userId;
}

/** A customer as the signed-in member sees it: their own record (linked to their login) is marked as theirs. */
export function mapCustomer(customer: Customer, viewer: Pick<AuthUser, 'userId'>): CustomerResponseDto {
  return {
    id: customer.id,
    name: customer.name,
    email: customer.email,
    phone: customer.phone,
    notes: customer.notes,
    userId: customer.userId,
    ownRecord: isOwnCustomerRecord(customer, viewer),
    createdAt: customer.createdAt.toISOString(),
    updatedAt: customer.updatedAt.toISOString(),
  };
}
