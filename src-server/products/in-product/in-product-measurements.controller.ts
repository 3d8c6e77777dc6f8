import {
  Body,
  Controller,
  Delete,
  Get,
  Header,
  HttpCode,
  Param,
  Post,
  Put,
  StreamableFile,
  UploadedFile as UploadedFileParam,
  UseInterceptors,
} from '@nestjs/common';
import { ApiBody, ApiConsumes, ApiCreatedResponse, ApiNoContentResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ALL_ROLES } from '../../common/roles';
import { ParseIdPipe } from '../../common/parse-id.pipe';
import { LimitedFileUpload } from '../../storage/limited-file-upload';
import { downloadOf } from '../../storage/file-response';
import type { UploadedFile } from '../../storage/uploaded-file';
import { ANTENNA_ROLES } from './antenna-roles';
import { IN_PRODUCT_MAX_BYTES } from './in-product-file';
import { InProductMeasurementsService } from './in-product-measurements.service';
import { InProductMeasurementDto, PortAssignmentDto, ProductIsolationDto, UploadInProductMeasurementDto } from './in-product.dto';

@ApiTags('in-product measurements')
@Controller('products/:id')
export class InProductMeasurementsController {
  constructor(private readonly measurements: InProductMeasurementsService) {}

  @Post('in-product-measurements')
  @Roles('engineer', 'admin')
  @UseInterceptors(LimitedFileUpload(IN_PRODUCT_MAX_BYTES, 'IN_PRODUCT_FILE_TOO_LARGE', 'an in-product measurement'))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file'],
      properties: { file: { type: 'string', format: 'binary', description: 'N-port Touchstone (.sNp or version 2 .ts)' }, note: { type: 'string' } },
    },
  })
  @ApiOperation({
    summary:
      'Upload an N-port Touchstone file measured or simulated in the product (engineer, admin); at most 16 MiB (413), text only (415); 422 { code, message, line } for a bad file, and nothing is stored',
  })
  @ApiCreatedResponse({ type: InProductMeasurementDto })
  upload(
    @Param('id', ParseIdPipe) id: number,
    @UploadedFileParam() file: UploadedFile | undefined,
    @Body() body: UploadInProductMeasurementDto,
    @CurrentUser() user: AuthUser,
  ): Promise<InProductMeasurementDto> {
    return this.measurements.upload(id, file, body, user);
  }

  @Get('in-product-measurements')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'The in-product measurements of a product with their port mappings' })
  @ApiOkResponse({ type: [InProductMeasurementDto] })
  list(@Param('id', ParseIdPipe) id: number): Promise<InProductMeasurementDto[]> {
    return this.measurements.list(id);
  }

  @Get('in-product-measurements/:measurementId')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'One in-product measurement: ports, reference resistances and port mapping' })
  @ApiOkResponse({ type: InProductMeasurementDto })
  get(@Param('id', ParseIdPipe) id: number, @Param('measurementId', ParseIdPipe) measurementId: number): Promise<InProductMeasurementDto> {
    return this.measurements.get(id, measurementId);
  }

  @Get('in-product-measurements/:measurementId/file')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'The original uploaded file, as text/plain' })
  @Header('X-Content-Type-Options', 'nosniff')
  async file(@Param('id', ParseIdPipe) id: number, @Param('measurementId', ParseIdPipe) measurementId: number): Promise<StreamableFile> {
    return downloadOf(await this.measurements.file(id, measurementId));
  }

  @Put('in-product-measurements/:measurementId/ports')
  @Roles('engineer', 'admin')
  @ApiBody({ type: [PortAssignmentDto] })
  @ApiOperation({
    summary: `Replace the port mapping: [{ port, radioId, role }] with role one of ${ANTENNA_ROLES.join(', ')}; 400 VALIDATION_FAILED names [i].port, [i].radioId or [i].role`,
  })
  @ApiOkResponse({ type: InProductMeasurementDto })
  mapPorts(
    @Param('id', ParseIdPipe) id: number,
    @Param('measurementId', ParseIdPipe) measurementId: number,
    @Body() body: unknown,
    @CurrentUser() user: AuthUser,
  ): Promise<InProductMeasurementDto> {
    return this.measurements.mapPorts(id, measurementId, body, user);
  }

  @Delete('in-product-measurements/:measurementId')
  @Roles('engineer', 'admin')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete an in-product measurement, its port mapping and its file' })
  @ApiNoContentResponse()
  remove(@Param('id', ParseIdPipe) id: number, @Param('measurementId', ParseIdPipe) measurementId: number, @CurrentUser() user: AuthUser): Promise<void> {
    return this.measurements.remove(id, measurementId, user);
  }

  @Get('isolation')
  @Roles(...ALL_ROLES)
  @ApiOperation({
    summary: 'Isolation between every two mapped antennas (worst per band pair, dB) and the envelope correlation between antennas of one radio per band',
  })
  @ApiOkResponse({ type: ProductIsolationDto })
  isolation(@Param('id', ParseIdPipe) id: number): Promise<ProductIsolationDto> {
    return this.measurements.isolation(id);
  }
}
