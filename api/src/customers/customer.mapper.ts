import { Customer } from './customer.entity';
import { CustomerResponseDto } from './dto/customer-response.dto';

export function mapCustomer(customer: Customer): CustomerResponseDto {
  return {
    id: customer.id,
    name: customer.name,
    email: customer.email,
    phone: customer.phone,
    notes: customer.notes,
    userId: customer.userId,
    createdAt: customer.createdAt.toISOString(),
    updatedAt: customer.updatedAt.toISOString(),
  };
}
