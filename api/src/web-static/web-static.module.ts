import { Inject, Module, OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { HttpAdapterHost } from '@nestjs/core';
import type { Express, NextFunction, Request, Response } from 'express';
import expressStaticGzip from 'express-static-gzip';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { AppConfigService } from '../config/app-config';
import { API_PREFIX } from '../app-setup';

/** Content-hashed build output (Vite writes every bundle, stylesheet and font under assets/ with a hash in its name). */
export const HASHED_ASSETS_CACHE = 'public, max-age=31536000, immutable';
/** index.html and other unhashed files: the browser asks again each time (a cheap 304), so a release shows at once. */
export const UNHASHED_CACHE = 'no-cache';

const HASHED_PREFIX = '/assets/';

/** The folder of the built web app (WEB_DIST_DIR), or null to serve the API only. */
export const WEB_DIST_DIR = Symbol('WEB_DIST_DIR');

function isApiPath(path: string): boolean {
  return path === `/${API_PREFIX}` || path.startsWith(`/${API_PREFIX}/`);
}

/**
 * Serves the built web app (WEB_DIST_DIR): the `.br` or `.gz` file written at build time when the browser accepts
 * it (express-static-gzip), hashed assets cached for a year as immutable, and index.html for every other
 * non-API path (client-side routing) with `no-cache`. Registered after the API routes, so /api never reaches it.
 */
@Module({
  providers: [
    {
      provide: WEB_DIST_DIR,
      inject: [ConfigService],
      useFactory: (config: AppConfigService) => config.get('WEB_DIST_DIR', { infer: true }) ?? null,
    },
  ],
})
export class WebStaticModule implements OnModuleInit {
  constructor(
    private readonly adapterHost: HttpAdapterHost,
    @Inject(WEB_DIST_DIR) private readonly root: string | null,
  ) {}

  onModuleInit(): void {
    const root = this.root;
    if (!root || !existsSync(join(root, 'index.html'))) return;
    const app = this.adapterHost.httpAdapter.getInstance<Express>();
    const serve = expressStaticGzip(root, {
      enableBrotli: true,
      orderPreference: ['br', 'gzip'],
      index: false,
      serveStatic: {
        index: false,
        cacheControl: false,
        setHeaders: (res, _filePath) => {
          const req = (res as Response).req;
          res.setHeader('Cache-Control', req.path.startsWith(HASHED_PREFIX) ? HASHED_ASSETS_CACHE : UNHASHED_CACHE);
        },
      },
    });
    const onlyPages = (req: Request, res: Response, next: NextFunction) => {
      if ((req.method !== 'GET' && req.method !== 'HEAD') || isApiPath(req.path)) return next();
      serve(req, res, () => {
        // Not a file: an app route gets index.html; a missing hashed asset stays a 404 (never HTML for a script).
        if (req.path.startsWith(HASHED_PREFIX)) return next();
        const originalUrl = req.url;
        req.url = '/index.html';
        serve(req, res, (error?: unknown) => {
          req.url = originalUrl;
          next(error);
        });
      });
    };
    app.use(onlyPages);
  }
}
