import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../common/auth.decorators';
import { ALL_ROLES } from '../common/roles';
import { ParseIdPipe } from '../common/parse-id.pipe';
import { BandSetsService } from './band-sets.service';
import { BandSetDto, BandSetVersionQueryDto, CreateBandSetDto, UpdateBandSetDto } from './dto/band-set.dto';

@ApiTags('band sets')
@Controller('band-sets')
export class BandSetsController {
  constructor(private readonly sets: BandSetsService) {}

  @Get()
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'All band sets with their bands' })
  @ApiOkResponse({ type: [BandSetDto] })
  list(): Promise<BandSetDto[]> {
    return this.sets.list();
  }

  @Get(':id')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'One band set' })
  @ApiOkResponse({ type: BandSetDto })
  get(@Param('id', ParseIdPipe) id: number): Promise<BandSetDto> {
    return this.sets.get(id);
  }

  @Post()
  @Roles('admin')
  @ApiOperation({ summary: 'Create a band set (admin)' })
  @ApiCreatedResponse({ type: BandSetDto })
  create(@Body() body: CreateBandSetDto, @CurrentUser() actor: AuthUser): Promise<BandSetDto> {
    return this.sets.create(body, actor);
  }

  @Patch(':id')
  @Roles('admin')
  @ApiOperation({ summary: 'Rename, describe or change the bands of a set; send the version you edited (admin)' })
  @ApiOkResponse({ type: BandSetDto })
  update(@Param('id', ParseIdPipe) id: number, @Body() body: UpdateBandSetDto, @CurrentUser() actor: AuthUser): Promise<BandSetDto> {
    return this.sets.update(id, body, actor);
  }

  @Delete(':id')
  @Roles('admin')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a band set; radios keep their bands (admin)' })
  @ApiNoContentResponse()
  remove(@Param('id', ParseIdPipe) id: number, @Query() query: BandSetVersionQueryDto, @CurrentUser() actor: AuthUser): Promise<void> {
    return this.sets.remove(id, query.version, actor);
  }
}
