import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../common/auth.decorators';
import { ALL_ROLES } from '../common/roles';
import { ParseIdPipe } from '../common/parse-id.pipe';
import { BandsService } from './bands.service';
import { BandQueryDto } from './dto/band-query.dto';
import { BandDto } from './dto/band-response.dto';
import { CreateBandDto, UpdateBandDto } from './dto/write-band.dto';

@ApiTags('bands')
@Controller('bands')
export class BandsController {
  constructor(private readonly bands: BandsService) {}

  @Get()
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'The band library; filter by technology, designation, or overlap with [fromMhz, toMhz]' })
  @ApiOkResponse({ type: [BandDto] })
  list(@Query() query: BandQueryDto): Promise<BandDto[]> {
    return this.bands.list(query);
  }

  @Get(':id')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'One band with its ranges and source' })
  @ApiOkResponse({ type: BandDto })
  get(@Param('id', ParseIdPipe) id: number): Promise<BandDto> {
    return this.bands.get(id);
  }

  @Post()
  @Roles('admin')
  @ApiOperation({ summary: 'Add a band to the library (admin)' })
  @ApiCreatedResponse({ type: BandDto })
  create(@Body() body: CreateBandDto, @CurrentUser() actor: AuthUser): Promise<BandDto> {
    return this.bands.create(body, actor);
  }

  @Patch(':id')
  @Roles('admin')
  @ApiOperation({ summary: 'Correct a band; given ranges replace the old ones (admin)' })
  @ApiOkResponse({ type: BandDto })
  update(@Param('id', ParseIdPipe) id: number, @Body() body: UpdateBandDto, @CurrentUser() actor: AuthUser): Promise<BandDto> {
    return this.bands.update(id, body, actor);
  }

  @Delete(':id')
  @Roles('admin')
  @HttpCode(204)
  @ApiOperation({ summary: 'Remove a band no set or radio uses (admin)' })
  @ApiNoContentResponse()
  remove(@Param('id', ParseIdPipe) id: number, @CurrentUser() actor: AuthUser): Promise<void> {
    return this.bands.remove(id, actor);
  }
}
