import { applyDecorators, Type } from '@nestjs/common';
import { ApiExtraModels, ApiOkResponse, ApiProperty, getSchemaPath } from '@nestjs/swagger';
import { Page } from './page-query.dto';

/** What every paged list answers besides its items. */
export class PageMetaResponseDto {
  @ApiProperty({ type: 'integer', description: 'Items matching the filters, across all pages' }) total: number;
  @ApiProperty({ type: 'integer', minimum: 1 }) page: number;
  @ApiProperty({ type: 'integer', minimum: 1 }) pageSize: number;
}

/**
 * Documents a route answering `Page<item>`: the one generic page schema (PageMetaResponseDto) with `items` typed.
 * The web reads it as `ResponseOf<path, 'get'>` (web/src/lib/api-types.ts).
 */
export function ApiPageResponse(item: Type<unknown>, description?: string): MethodDecorator {
  return applyDecorators(
    ApiExtraModels(PageMetaResponseDto, item),
    ApiOkResponse({
      description,
      schema: {
        allOf: [
          { $ref: getSchemaPath(PageMetaResponseDto) },
          {
            type: 'object',
            properties: { items: { type: 'array', items: { $ref: getSchemaPath(item) } } },
            required: ['items'],
          },
        ],
      },
    }),
  );
}

/** Maps the items of a page, keeping its counts. */
export function mapPage<T, R>(page: Page<T>, map: (item: T) => R): Page<R> {
  return { ...page, items: page.items.map(map) };
}
