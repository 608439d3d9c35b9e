import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiNoContentResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { ApiPageResponse, mapPage } from '../common/pagination/page-response';
import { Page } from '../common/pagination/page-query.dto';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { CUSTOMER_READERS, CUSTOMER_WRITERS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { mapCustomer } from './customer.mapper';
import { CustomersService } from './customers.service';
import { CreateCustomerDto } from './dto/create-customer.dto';
import { CustomerResponseDto } from './dto/customer-response.dto';
import { ListCustomersQueryDto } from './dto/list-customers-query.dto';
import { UpdateCustomerDto } from './dto/update-customer.dto';

@ApiTags('customers')
@ApiBearerAuth()
@Controller('customers')
export class CustomersController {
  constructor(private readonly customers: CustomersService) {}

  @Get()
  @Roles(...CUSTOMER_READERS)
  @ApiPageResponse(CustomerResponseDto)
  async list(@CurrentUser() user: AuthUser, @Query() query: ListCustomersQueryDto): Promise<Page<CustomerResponseDto>> {
    return mapPage(await this.customers.list(user, query), (customer) => mapCustomer(customer, user));
  }

  @Post()
  @Roles(...CUSTOMER_WRITERS)
  @ApiCreatedResponse({ type: CustomerResponseDto })
  async create(@CurrentUser() user: AuthUser, @Body() body: CreateCustomerDto): Promise<CustomerResponseDto> {
    return mapCustomer(await this.customers.create(user, body), user);
  }

  @Get(':id')
  @Roles(...CUSTOMER_READERS)
  @ApiOkResponse({ type: CustomerResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async get(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<CustomerResponseDto> {
    return mapCustomer(await this.customers.get(user, id), user);
  }

  @Patch(':id')
  @Roles(...CUSTOMER_WRITERS)
  @ApiOkResponse({ type: CustomerResponseDto })
  async update(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Body() body: UpdateCustomerDto,
  ): Promise<CustomerResponseDto> {
    return mapCustomer(await this.customers.update(user, id, body), user);
  }

  @Delete(':id')
  @Roles(...CUSTOMER_WRITERS)
  @HttpCode(204)
  @ApiNoContentResponse()
  async remove(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<void> {
    await this.customers.remove(user, id);
  }
}
