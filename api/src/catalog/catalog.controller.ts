import {
  ArgumentMetadata,
  Body,
  Controller,
  Delete,
  Get,
  HttpCode,
  Injectable,
  Param,
  Patch,
  PipeTransform,
  Post,
  Query,
  Type,
} from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiBody,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { Page } from '../common/pagination/page-query.dto';
import { ApiPageResponse, mapPage } from '../common/pagination/page-response';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { createValidationPipe } from '../common/pipes/validation.pipe';
import { withArticle } from '../common/text/article';
import { CATALOG_READERS, CATALOG_WRITERS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { CatalogService } from './catalog.service';
import { CATALOG_KINDS, CatalogKindDefinition } from './catalog-kinds';
import { mapCatalogItem } from './catalog-item.mapper';
import { CatalogItemResponseDto } from './dto/catalog-item-response.dto';
import { ListCatalogQueryDto } from './dto/list-catalog-query.dto';

/**
 * The global ValidationPipe validates by the parameter's declared class; the catalog controllers are made
 * per kind, so the body class is named here instead (same options as the global pipe).
 */
@Injectable()
export class ValidateAsPipe implements PipeTransform {
  private readonly pipe = createValidationPipe();

  constructor(private readonly type: Type<object>) {}

  transform(value: unknown, metadata: ArgumentMetadata): Promise<unknown> {
    return this.pipe.transform(value, { ...metadata, metatype: this.type });
  }
}

function titleOf(definition: CatalogKindDefinition): string {
  return definition.kind
    .split('-')
    .map((word) => word[0].toUpperCase() + word.slice(1))
    .join('');
}

/** One thin controller per catalog kind under /catalog/<kind>; every kind shares CatalogService. */
export function createCatalogController(definition: CatalogKindDefinition): Type<unknown> {
  const kind = definition.kind;
  const one = definition.singular;

  @ApiTags('catalog')
  @ApiBearerAuth()
  @ApiForbiddenResponse({ type: ErrorResponseDto, description: 'Customers have no catalog access' })
  @Controller(`catalog/${kind}`)
  class KindCatalogController {
    constructor(readonly catalog: CatalogService) {}

    @Get()
    @Roles(...CATALOG_READERS)
    @ApiOperation({ summary: `List the shop's ${kind}`, operationId: `list${titleOf(definition)}` })
    @ApiPageResponse(definition.responseDto)
    @ApiBadRequestResponse({ type: ErrorResponseDto })
    async list(@CurrentUser() user: AuthUser, @Query() query: ListCatalogQueryDto): Promise<Page<CatalogItemResponseDto>> {
      return mapPage(await this.catalog.list(kind, user, query), (row) => mapCatalogItem(definition, row));
    }

    @Post()
    @Roles(...CATALOG_WRITERS)
    @ApiOperation({ summary: `Add ${withArticle(one)} to the catalog`, operationId: `create${titleOf(definition)}` })
    @ApiBody({ type: definition.createDto })
    @ApiCreatedResponse({ type: definition.responseDto })
    @ApiBadRequestResponse({ type: ErrorResponseDto })
    async create(
      @CurrentUser() user: AuthUser,
      @Body(new ValidateAsPipe(definition.createDto)) body: object,
    ): Promise<CatalogItemResponseDto> {
      return mapCatalogItem(definition, await this.catalog.create(kind, user, body));
    }

    @Get(':id')
    @Roles(...CATALOG_READERS)
    @ApiOperation({ summary: `One ${one}`, operationId: `get${titleOf(definition)}` })
    @ApiOkResponse({ type: definition.responseDto })
    @ApiNotFoundResponse({ type: ErrorResponseDto })
    async get(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<CatalogItemResponseDto> {
      return mapCatalogItem(definition, await this.catalog.get(kind, user, id));
    }

    @Patch(':id')
    @Roles(...CATALOG_WRITERS)
    @ApiOperation({ summary: `Change ${withArticle(one)}: given top-level fields replace the stored ones`, operationId: `update${titleOf(definition)}` })
    @ApiBody({ type: definition.updateDto })
    @ApiOkResponse({ type: definition.responseDto })
    @ApiBadRequestResponse({ type: ErrorResponseDto })
    @ApiNotFoundResponse({ type: ErrorResponseDto })
    async update(
      @CurrentUser() user: AuthUser,
      @Param('id', ParseIdPipe) id: string,
      @Body(new ValidateAsPipe(definition.updateDto)) body: object,
    ): Promise<CatalogItemResponseDto> {
      return mapCatalogItem(definition, await this.catalog.update(kind, user, id, body));
    }

    @Delete(':id')
    @Roles(...CATALOG_WRITERS)
    @HttpCode(204)
    @ApiOperation({ summary: `Remove ${withArticle(one)} (refused while a project's fit selections use it)`, operationId: `delete${titleOf(definition)}` })
    @ApiNoContentResponse()
    @ApiNotFoundResponse({ type: ErrorResponseDto })
    async remove(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<void> {
      await this.catalog.remove(kind, user, id);
    }
  }

  Object.defineProperty(KindCatalogController, 'name', { value: `${titleOf(definition)}CatalogController` });
  return KindCatalogController;
}

export const CATALOG_CONTROLLERS = Object.values(CATALOG_KINDS).map(createCatalogController);
