import { AuthUser } from '../common/tenant/auth-user';
import { Shop } from '../shops/shop.entity';
import { CurrentUserResponseDto } from './dto/session-response.dto';

export function mapCurrentUser(user: AuthUser, shop: Pick<Shop, 'id' | 'name' | 'unitSystem'>): CurrentUserResponseDto {
  return {
    id: user.userId,
    email: user.email,
    name: user.name,
    role: user.role,
    shop: { id: shop.id, name: shop.name, unitSystem: shop.unitSystem },
    customerId: user.customerId,
  };
}
