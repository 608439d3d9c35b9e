/**
 * Short names for the generated API types. `api-schema.d.ts` is generated from the API's OpenAPI document
 * (`npm run openapi`); never edit it, and never write a copy of an API shape by hand: take it from here.
 *
 *   import type { Schemas } from '@/lib/api-types';
 *   type Customer = Schemas['CustomerResponseDto'];
 */
import type { components, paths } from './api-schema';

export type { components, paths } from './api-schema';

/** Every request and response body the API declares, by its schema name. */
export type Schemas = components['schemas'];

type JsonContent<T> = T extends { content: { 'application/json': infer Body } } ? Body : never;
type Operation<P extends keyof paths, M extends keyof paths[P]> = paths[P][M];

/** The JSON a route answers with on success (200 or 201), e.g. `ResponseOf<'/api/customers/{id}', 'get'>`. */
export type ResponseOf<P extends keyof paths, M extends keyof paths[P]> =
  Operation<P, M> extends { responses: infer R }
    ? R extends { 200: infer Ok } ? JsonContent<Ok> : R extends { 201: infer Created } ? JsonContent<Created> : never
    : never;

/** The JSON body a route takes, e.g. `RequestBodyOf<'/api/customers', 'post'>`. */
export type RequestBodyOf<P extends keyof paths, M extends keyof paths[P]> =
  Operation<P, M> extends { requestBody?: infer B } ? JsonContent<NonNullable<B>> : never;

/** The query parameters of a route, e.g. `QueryOf<'/api/customers', 'get'>`. */
export type QueryOf<P extends keyof paths, M extends keyof paths[P]> =
  Operation<P, M> extends { parameters: { query?: infer Q } } ? NonNullable<Q> : never;

/** A paged list's query parameters as the web sends them: page and size always (the tables keep them in the URL). */
export type PagedQueryOf<P extends keyof paths> = QueryOf<P, 'get' & keyof paths[P]> & { page: number; pageSize: number };

/** Names for the shapes that more than one part of the web uses (features keep their own beside their api/). */
export type CurrentUser = Schemas['CurrentUserResponseDto'];
export type Session = Schemas['SessionResponseDto'];
/** Sort direction of every paged list (`order=asc|desc`). */
export type SortOrder = NonNullable<QueryOf<'/api/customers', 'get'>['order']>;
