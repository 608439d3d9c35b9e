import { AuthUser } from '../common/tenant/auth-user';
import { Shop } from '../shops/shop.entity';
import { CurrentUserResponseDto, SessionResponseDto } from './dto/session-response.dto';
import type { IssuedSession } from './sessions.service';

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

export function mapSession(session: IssuedSession): SessionResponseDto {
  return {
    accessToken: session.accessToken,
    refreshToken: session.refreshToken,
    expiresIn: session.expiresIn,
    user: mapCurrentUser(session.member, session.shop),
  };
}
