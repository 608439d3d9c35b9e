import { ApiProperty } from '@nestjs/swagger';
import { Role, ROLES } from '../../common/roles/role';
import { UNIT_SYSTEMS, UnitSystem } from '../../shops/shop.entity';

export class CurrentUserShopDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: UNIT_SYSTEMS }) unitSystem: UnitSystem;
}

export class CurrentUserResponseDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() email: string;
  @ApiProperty() name: string;
  @ApiProperty({ enum: ROLES }) role: Role;
  @ApiProperty({ type: CurrentUserShopDto }) shop: CurrentUserShopDto;
  @ApiProperty({ type: String, nullable: true, format: 'uuid' }) customerId: string | null;
}

export class SessionResponseDto {
  @ApiProperty() accessToken: string;
  @ApiProperty({ description: 'Opaque; each use returns a new one and the old one stops working' }) refreshToken: string;
  @ApiProperty({ description: 'Seconds until the access token expires', example: 900 }) expiresIn: number;
  @ApiProperty({ type: CurrentUserResponseDto }) user: CurrentUserResponseDto;
}
