import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../common/auth.decorators';
import { ALL_ROLES } from '../common/roles';
import { ParseIdPipe } from '../common/parse-id.pipe';
import { RegulatoryLimitsService } from './regulatory-limits.service';
import { CreateRegulatoryLimitDto, RegulatoryLimitDto, RegulatoryLimitQueryDto, UpdateRegulatoryLimitDto } from './dto/regulatory-limit.dto';

@ApiTags('regulatory limits')
@Controller('regulatory-limits')
export class RegulatoryLimitsController {
  constructor(private readonly limits: RegulatoryLimitsService) {}

  @Get()
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'Regulatory power limits; filter by region and frequency window' })
  @ApiOkResponse({ type: [RegulatoryLimitDto] })
  list(@Query() query: RegulatoryLimitQueryDto): Promise<RegulatoryLimitDto[]> {
    return this.limits.list(query);
  }

  @Get(':id')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'One regulatory limit' })
  @ApiOkResponse({ type: RegulatoryLimitDto })
  get(@Param('id', ParseIdPipe) id: number): Promise<RegulatoryLimitDto> {
    return this.limits.get(id);
  }

  @Post()
  @Roles('admin')
  @ApiOperation({ summary: 'Add a regulatory limit (admin)' })
  @ApiCreatedResponse({ type: RegulatoryLimitDto })
  create(@Body() body: CreateRegulatoryLimitDto, @CurrentUser() actor: AuthUser): Promise<RegulatoryLimitDto> {
    return this.limits.create(body, actor);
  }

  @Patch(':id')
  @Roles('admin')
  @ApiOperation({ summary: 'Correct a regulatory limit (admin)' })
  @ApiOkResponse({ type: RegulatoryLimitDto })
  update(@Param('id', ParseIdPipe) id: number, @Body() body: UpdateRegulatoryLimitDto, @CurrentUser() actor: AuthUser): Promise<RegulatoryLimitDto> {
    return this.limits.update(id, body, actor);
  }

  @Delete(':id')
  @Roles('admin')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a regulatory limit (admin)' })
  @ApiNoContentResponse()
  remove(@Param('id', ParseIdPipe) id: number, @CurrentUser() actor: AuthUser): Promise<void> {
    return this.limits.remove(id, actor);
  }
}
