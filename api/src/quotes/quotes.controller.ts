import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Patch, Post, Put, Query, Res, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiProduces, ApiQuery, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import {
  QUOTE_ANSWERERS,
  QUOTE_READERS,
  QUOTE_SETTINGS_READERS,
  QUOTE_SETTINGS_WRITERS,
  QUOTE_WRITERS,
} from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { AnswerQuoteDto, CreateQuoteDto, UpdateQuoteDto, UpdateQuoteSettingsDto } from './dto/quote-input.dto';
import {
  OwnBuildResponseDto,
  QuoteNotificationResponseDto,
  QuoteResponseDto,
  QuoteRevisionDiffResponseDto,
  QuoteSettingsResponseDto,
} from './dto/quote-response.dto';
import { mapQuote, mapQuoteNotification, mapQuoteSettings, mapRevisionDiff } from './quote.mapper';
import { QuoteSettingsService } from './quote-settings.service';
import { QUOTE_STATUSES } from './quote.entity';
import { QuotesService } from './quotes.service';

function pdfFile(response: Response, file: { fileName: string; content: Buffer }): StreamableFile {
  response.setHeader('Content-Disposition', `inline; filename="${file.fileName}"`);
  return new StreamableFile(file.content, { type: 'application/pdf', length: file.content.length });
}

@ApiTags('quotes')
@ApiBearerAuth()
@Controller('projects/:projectId/quotes')
export class ProjectQuotesController {
  constructor(private readonly quotes: QuotesService) {}

  @Get()
  @Roles(...QUOTE_READERS)
  @ApiOkResponse({ type: [QuoteResponseDto] })
  async list(@CurrentUser() user: AuthUser, @Param('projectId', ParseIdPipe) projectId: string): Promise<QuoteResponseDto[]> {
    return (await this.quotes.listForProject(user, projectId)).map((view) => mapQuote(view, user));
  }

  @Post()
  @Roles(...QUOTE_WRITERS)
  @ApiCreatedResponse({ type: QuoteResponseDto, description: 'Without lines, the first draft is drawn from the fit report and the shop\'s labor operations.' })
  async create(@CurrentUser() user: AuthUser, @Param('projectId', ParseIdPipe) projectId: string, @Body() body: CreateQuoteDto): Promise<QuoteResponseDto> {
    return mapQuote(await this.quotes.create(user, projectId, body), user);
  }
}

@ApiTags('quotes')
@ApiBearerAuth()
@Controller('quotes')
export class QuotesController {
  constructor(private readonly quotes: QuotesService) {}

  @Get()
  @Roles(...QUOTE_WRITERS)
  @ApiOkResponse({ type: [QuoteResponseDto], description: "The shop's newest quotes (up to 100), optionally of one status" })
  @ApiQuery({ name: 'status', required: false, enum: QUOTE_STATUSES })
  async list(@CurrentUser() user: AuthUser, @Query('status') status?: string): Promise<QuoteResponseDto[]> {
    return (await this.quotes.listForShop(user, status)).map((view) => mapQuote(view, user));
  }

  @Get('notifications')
  @Roles(...QUOTE_WRITERS)
  @ApiOkResponse({ type: [QuoteNotificationResponseDto] })
  async notifications(@CurrentUser() user: AuthUser): Promise<QuoteNotificationResponseDto[]> {
    return (await this.quotes.notificationsFor(user)).map(mapQuoteNotification);
  }

  @Get(':id')
  @Roles(...QUOTE_READERS)
  @ApiOkResponse({ type: QuoteResponseDto })
  @ApiQuery({ name: 'revision', required: false, type: Number })
  async get(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Query('revision', new ParseIntPipe({ optional: true })) revision?: number,
  ): Promise<QuoteResponseDto> {
    return mapQuote(await this.quotes.revision(user, id, revision), user);
  }

  @Patch(':id')
  @Roles(...QUOTE_WRITERS)
  @ApiOkResponse({ type: QuoteResponseDto, description: 'Edits the working revision; once the newest was sent, the edit starts the next revision.' })
  async update(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: UpdateQuoteDto): Promise<QuoteResponseDto> {
    return mapQuote(await this.quotes.update(user, id, body), user);
  }

  @Post(':id/send')
  @HttpCode(200)
  @Roles(...QUOTE_WRITERS)
  @ApiOkResponse({ type: QuoteResponseDto, description: 'Freezes the working revision and queues its e-mail with the PDF and an approval link (sent by the background worker within moments).' })
  async send(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<QuoteResponseDto> {
    return mapQuote(await this.quotes.send(user, id), user);
  }

  @Post(':id/start-own-build')
  @HttpCode(200)
  @Roles(...QUOTE_WRITERS)
  @ApiOkResponse({
    type: OwnBuildResponseDto,
    description:
      "Only for a quote of the member's own truck: freezes the working revision as the approved budget (no e-mail, no deposit due), moves the project to its deposit-paid stage and opens the work order. Once started, answers 409.",
  })
  async startOwnBuild(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<OwnBuildResponseDto> {
    const { view, workOrderId } = await this.quotes.startOwnBuild(user, id);
    return { quote: mapQuote(view, user), workOrderId };
  }

  @Post(':id/answer')
  @HttpCode(200)
  @Roles(...QUOTE_ANSWERERS)
  @ApiOkResponse({ type: QuoteResponseDto })
  async answer(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string, @Body() body: AnswerQuoteDto): Promise<QuoteResponseDto> {
    return mapQuote(await this.quotes.answer({ kind: 'member', user }, id, body), user);
  }

  @Get(':id/compare')
  @Roles(...QUOTE_READERS)
  @ApiOkResponse({ type: QuoteRevisionDiffResponseDto })
  async compare(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Query('from', ParseIntPipe) from: number,
    @Query('to', ParseIntPipe) to: number,
  ): Promise<QuoteRevisionDiffResponseDto> {
    return mapRevisionDiff(await this.quotes.compare(user, id, from, to));
  }

  @Get(':id/pdf')
  @Roles(...QUOTE_READERS)
  @ApiProduces('application/pdf')
  @ApiQuery({ name: 'revision', required: false, type: Number })
  async pdf(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Res({ passthrough: true }) response: Response,
    @Query('revision', new ParseIntPipe({ optional: true })) revision?: number,
  ): Promise<StreamableFile> {
    return pdfFile(response, await this.quotes.pdfOf(user, id, revision));
  }
}

/** The customer's approval page, reached through the signed link in the quote e-mail (no sign-in). */
@ApiTags('quotes')
@Controller('quote-links/:token')
export class QuoteLinksController {
  constructor(private readonly quotes: QuotesService) {}

  @Public()
  @Get()
  @ApiOkResponse({ type: QuoteResponseDto })
  async get(@Param('token') token: string): Promise<QuoteResponseDto> {
    return mapQuote(await this.quotes.getByLink(token), 'link');
  }

  @Public()
  @Post('answer')
  @HttpCode(200)
  @ApiOkResponse({ type: QuoteResponseDto })
  async answer(@Param('token') token: string, @Body() body: AnswerQuoteDto): Promise<QuoteResponseDto> {
    return mapQuote(await this.quotes.answer({ kind: 'link', shopId: '' }, token, body), 'link');
  }

  @Public()
  @Get('pdf')
  @ApiProduces('application/pdf')
  async pdf(@Param('token') token: string, @Res({ passthrough: true }) response: Response): Promise<StreamableFile> {
    return pdfFile(response, await this.quotes.pdfByLink(token));
  }
}

@ApiTags('quotes')
@ApiBearerAuth()
@Controller('quote-settings')
export class QuoteSettingsController {
  constructor(private readonly settings: QuoteSettingsService) {}

  @Get()
  @Roles(...QUOTE_SETTINGS_READERS)
  @ApiOkResponse({ type: QuoteSettingsResponseDto })
  async get(@CurrentUser() user: AuthUser): Promise<QuoteSettingsResponseDto> {
    return mapQuoteSettings(await this.settings.forShop(user));
  }

  @Put()
  @Roles(...QUOTE_SETTINGS_WRITERS)
  @ApiOkResponse({ type: QuoteSettingsResponseDto })
  async update(@CurrentUser() user: AuthUser, @Body() body: UpdateQuoteSettingsDto): Promise<QuoteSettingsResponseDto> {
    return mapQuoteSettings(await this.settings.update(user, body));
  }
}
