import { ApiProperty } from '@nestjs/swagger';

export class CustomerResponseDto {
  @ApiProperty({ format: 'uuid' }) id: string;
  @ApiProperty() name: string;
  @ApiProperty({ type: String, nullable: true }) email: string | null;
  @ApiProperty({ type: String, nullable: true }) phone: string | null;
  @ApiProperty({ type: String, nullable: true }) notes: string | null;
  @ApiProperty({ type: String, nullable: true, format: 'uuid', description: 'The login of this customer, if invited' })
  userId: string | null;
  @ApiProperty({
    description:
      "True for the signed-in member's own record (linked to their login): the projects they open for their own vehicle are filed under it. It is not a customer to invite.",
  })
  ownRecord: boolean;
  @ApiProperty() createdAt: string;
  @ApiProperty() updatedAt: string;
}

