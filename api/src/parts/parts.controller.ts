import { Body, Controller, Delete, Get, Header, HttpCode, Param, Patch, Post, Put, Query, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBadRequestResponse, ApiBearerAuth, ApiBody, ApiConflictResponse, ApiConsumes, ApiCreatedResponse, ApiNotFoundResponse, ApiOkResponse, ApiOperation, ApiProduces, ApiTags } from '@nestjs/swagger';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { AppError } from '../common/errors/app-error';
import { Page, PageQueryDto } from '../common/pagination/page-query.dto';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { CATALOG_READERS, CATALOG_WRITERS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import {
  CreatePartDto,
  CreateSupplierDto,
  ImportPreviewResponseDto,
  ListPartsQueryDto,
  PartPageResponseDto,
  SupplierPageResponseDto,
  PartResponseDto,
  SetStockDto,
  SupplierResponseDto,
  UpdatePartDto,
  UpdateSupplierDto,
} from './dto/part.dto';
import { ImportMappingDto } from './dto/plan.dto';
import { mapPart, mapSupplier } from './part.mapper';
import { ImportMapping, PartsImportService } from './parts-import.service';
import { PartsService } from './parts.service';

/** The part of a multer upload the import reads. */
type UploadedCsv = { buffer: Buffer; originalname?: string };

const MAX_UPLOAD_BYTES = 20 * 1024 * 1024;

function csvText(file: UploadedCsv | undefined): string {
  if (!file) throw new AppError(400, 'csv_missing', 'Attach the CSV file as the "file" field.');
  return file.buffer.toString('utf8');
}

function mappingOf(body: ImportMappingDto): ImportMapping | undefined {
  if (!body.mapping) return undefined;
  try {
    const value = JSON.parse(body.mapping) as unknown;
    if (value && typeof value === 'object' && !Array.isArray(value) && Object.values(value).every((v) => typeof v === 'string')) return value as ImportMapping;
  } catch {
    // refused below
  }
  throw new AppError(400, 'csv_mapping', 'mapping must be a JSON object of field names to column headers.');
}

const UPLOAD = FileInterceptor('file', { limits: { fileSize: MAX_UPLOAD_BYTES } });

@ApiTags('parts')
@ApiBearerAuth()
@Controller('parts')
export class PartsController {
  constructor(
    private readonly parts: PartsService,
    private readonly importer: PartsImportService,
  ) {}

  @Get()
  @Roles(...CATALOG_READERS)
  @ApiOperation({ summary: "List the shop's parts with stock (search SKU, description, supplier SKU; filter category, supplier, in stock)", operationId: 'listParts' })
  @ApiOkResponse({ type: PartPageResponseDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  async list(@CurrentUser() user: AuthUser, @Query() query: ListPartsQueryDto): Promise<Page<PartResponseDto>> {
    const page = await this.parts.list(user, query);
    return { ...page, items: page.items.map((p) => mapPart(p.part, p.stock, p.supplierName)) };
  }

  @Get('export.csv')
  @Roles(...CATALOG_READERS)
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @Header('Content-Disposition', 'attachment; filename="parts-catalog.csv"')
  @ApiOperation({ summary: 'The catalog as CSV (the import columns)', operationId: 'exportParts' })
  @ApiProduces('text/csv')
  @ApiOkResponse({ schema: { type: 'string' } })
  async exportCsv(@CurrentUser() user: AuthUser): Promise<string> {
    return this.importer.exportCsv(user);
  }

  @Post('import/preview')
  @HttpCode(200)
  @Roles(...CATALOG_WRITERS)
  @UseInterceptors(UPLOAD)
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' }, mapping: { type: 'string' } } } })
  @ApiOperation({ summary: 'Read a CSV without writing: column mapping, every row error, formula warnings', operationId: 'previewPartsImport' })
  @ApiOkResponse({ type: ImportPreviewResponseDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  preview(@UploadedFile() file: UploadedCsv | undefined, @Body() body: ImportMappingDto): ImportPreviewResponseDto {
    return this.importer.parse(csvText(file), mappingOf(body)).preview;
  }

  @Post('import')
  @HttpCode(200)
  @Roles(...CATALOG_WRITERS)
  @UseInterceptors(UPLOAD)
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' }, mapping: { type: 'string' } } } })
  @ApiOperation({ summary: 'Import a CSV: all or nothing in one transaction, upserting by SKU', operationId: 'importParts' })
  @ApiOkResponse({ type: ImportPreviewResponseDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto, description: 'Any row error: nothing written; details list the lines' })
  async import(@CurrentUser() user: AuthUser, @UploadedFile() file: UploadedCsv | undefined, @Body() body: ImportMappingDto): Promise<ImportPreviewResponseDto> {
    const result = await this.importer.import(user, csvText(file), mappingOf(body));
    return { ...result, rejected: [], errors: [] };
  }

  @Post()
  @Roles(...CATALOG_WRITERS)
  @ApiOperation({ summary: 'Add a part to the catalog', operationId: 'createPart' })
  @ApiCreatedResponse({ type: PartResponseDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto })
  async create(@CurrentUser() user: AuthUser, @Body() body: CreatePartDto): Promise<PartResponseDto> {
    const p = await this.parts.create(user, body);
    return mapPart(p.part, p.stock, p.supplierName);
  }

  @Get(':id')
  @Roles(...CATALOG_READERS)
  @ApiOperation({ summary: 'One part with its stock', operationId: 'getPart' })
  @ApiOkResponse({ type: PartResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async get(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<PartResponseDto> {
    const p = await this.parts.get(user, id);
    return mapPart(p.part, p.stock, p.supplierName);
  }

  @Patch(':id')
  @Roles(...CATALOG_WRITERS)
  @ApiOperation({ summary: 'Change a part', operationId: 'updatePart' })
  @ApiOkResponse({ type: PartResponseDto })
  @ApiBadRequestResponse({ type: ErrorResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto })
  async update(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: UpdatePartDto): Promise<PartResponseDto> {
    const p = await this.parts.update(user, id, body);
    return mapPart(p.part, p.stock, p.supplierName);
  }

  @Put(':id/stock')
  @Roles(...CATALOG_WRITERS)
  @ApiOperation({ summary: 'Set the count on hand at one location and bin', operationId: 'setPartStock' })
  @ApiOkResponse({ type: PartResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto, description: 'Fewer on hand than are reserved there' })
  async setStock(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: SetStockDto): Promise<PartResponseDto> {
    const p = await this.parts.setStock(user, id, body);
    return mapPart(p.part, p.stock, p.supplierName);
  }

  @Delete(':id')
  @HttpCode(204)
  @Roles(...CATALOG_WRITERS)
  @ApiOperation({ summary: 'Remove a part', operationId: 'deletePart' })
  async remove(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<void> {
    await this.parts.remove(user, id);
  }
}

@ApiTags('parts')
@ApiBearerAuth()
@Controller('suppliers')
export class SuppliersController {
  constructor(private readonly parts: PartsService) {}

  @Get()
  @Roles(...CATALOG_READERS)
  @ApiOperation({ summary: "The shop's suppliers", operationId: 'listSuppliers' })
  @ApiOkResponse({ type: SupplierPageResponseDto })
  async list(@CurrentUser() user: AuthUser, @Query() query: PageQueryDto): Promise<Page<SupplierResponseDto>> {
    const page = await this.parts.listSuppliers(user, query);
    return { ...page, items: page.items.map(mapSupplier) };
  }

  @Post()
  @Roles(...CATALOG_WRITERS)
  @ApiOperation({ summary: 'Add a supplier', operationId: 'createSupplier' })
  @ApiCreatedResponse({ type: SupplierResponseDto })
  @ApiConflictResponse({ type: ErrorResponseDto })
  async create(@CurrentUser() user: AuthUser, @Body() body: CreateSupplierDto): Promise<SupplierResponseDto> {
    return mapSupplier(await this.parts.createSupplier(user, body));
  }

  @Patch(':id')
  @Roles(...CATALOG_WRITERS)
  @ApiOkResponse({ type: SupplierResponseDto })
  @ApiOperation({ summary: 'Change a supplier', operationId: 'updateSupplier' })
  async update(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: UpdateSupplierDto): Promise<SupplierResponseDto> {
    return mapSupplier(await this.parts.updateSupplier(user, id, body));
  }

  @Delete(':id')
  @HttpCode(204)
  @Roles(...CATALOG_WRITERS)
  @ApiOperation({ summary: 'Remove a supplier (its parts keep their data, without a supplier)', operationId: 'deleteSupplier' })
  async remove(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<void> {
    await this.parts.removeSupplier(user, id);
  }
}
