import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiCreatedResponse, ApiNoContentResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator';
import { Roles } from '../common/decorators/roles.decorator';
import { ErrorResponseDto } from '../common/errors/error-response.dto';
import { ApiPageResponse, mapPage } from '../common/pagination/page-response';
import { Page } from '../common/pagination/page-query.dto';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { PROJECT_EDITORS, PROJECT_READERS, PROJECT_WRITERS } from '../common/roles/role-matrix';
import { AuthUser } from '../common/tenant/auth-user';
import { CreateProjectDto } from './dto/create-project.dto';
import { ListProjectsQueryDto } from './dto/list-projects-query.dto';
import { ProjectResponseDto } from './dto/project-response.dto';
import { UpdateProjectDto } from './dto/update-project.dto';
import { mapProject } from './project.mapper';
import { ProjectsService } from './projects.service';

@ApiTags('projects')
@ApiBearerAuth()
@Controller('projects')
export class ProjectsController {
  constructor(private readonly projects: ProjectsService) {}

  @Get()
  @Roles(...PROJECT_READERS)
  @ApiPageResponse(ProjectResponseDto)
  async list(@CurrentUser() user: AuthUser, @Query() query: ListProjectsQueryDto): Promise<Page<ProjectResponseDto>> {
    return mapPage(await this.projects.list(user, query), (project) => mapProject(project, user));
  }

  @Post()
  @Roles(...PROJECT_WRITERS)
  @ApiCreatedResponse({ type: ProjectResponseDto })
  async create(@CurrentUser() user: AuthUser, @Body() body: CreateProjectDto): Promise<ProjectResponseDto> {
    return mapProject(await this.projects.create(user, body), user);
  }

  @Get(':id')
  @Roles(...PROJECT_READERS)
  @ApiOkResponse({ type: ProjectResponseDto })
  @ApiNotFoundResponse({ type: ErrorResponseDto })
  async get(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<ProjectResponseDto> {
    return mapProject(await this.projects.get(user, id), user);
  }

  @Patch(':id')
  @Roles(...PROJECT_EDITORS)
  @ApiOkResponse({ type: ProjectResponseDto })
  async update(
    @CurrentUser() user: AuthUser,
    @Param('id', ParseIdPipe) id: string,
    @Body() body: UpdateProjectDto,
  ): Promise<ProjectResponseDto> {
    return mapProject(await this.projects.update(user, id, body), user);
  }

  @Delete(':id')
  @Roles(...PROJECT_WRITERS)
  @HttpCode(204)
  @ApiNoContentResponse()
  async remove(@CurrentUser() user: AuthUser, @Param('id', ParseIdPipe) id: string): Promise<void> {
    await this.projects.remove(user, id);
  }
}
