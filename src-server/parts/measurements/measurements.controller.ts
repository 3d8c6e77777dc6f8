import {
  Body,
  Controller,
  Delete,
  Get,
  Header,
  HttpCode,
  Param,
  Post,
  StreamableFile,
  UploadedFile as UploadedFileParam,
  UseInterceptors,
} from '@nestjs/common';
import { ApiBody, ApiConsumes, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ALL_ROLES } from '../../common/roles';
import { ParseIdPipe } from '../../common/parse-id.pipe';
import { LimitedFileUpload } from '../../storage/limited-file-upload';
import { downloadOf } from '../../storage/file-response';
import type { UploadedFile } from '../../storage/uploaded-file';
import { MEASUREMENT_MAX_BYTES, MeasurementsService } from './measurements.service';
import { UploadMeasurementDto, UploadMeasurementResultDto } from '../dto/upload.dto';
import { MeasurementPointsDto } from '../dto/part-response.dto';
import { MEASUREMENT_BASES, MEASUREMENT_KINDS } from '../part.types';

@ApiTags('part measurements')
@Controller('parts/:id/measurements')
export class MeasurementsController {
  constructor(private readonly measurements: MeasurementsService) {}

  @Post()
  @Roles('engineer', 'admin')
  @UseInterceptors(LimitedFileUpload(MEASUREMENT_MAX_BYTES, 'MEASUREMENT_FILE_TOO_LARGE', 'a measurement file'))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file', 'kind'],
      properties: {
        file: { type: 'string', format: 'binary' },
        kind: { type: 'string', enum: [...MEASUREMENT_KINDS] },
        basis: {
          type: 'string',
          enum: [...MEASUREMENT_BASES],
          description:
            'Required for efficiency (radiation: mismatch left out; total: mismatch included) and gains (peak: the antenna gain; realized: mismatch included); left out for s11. 400 VALIDATION_FAILED naming `basis` when missing or not of the kind',
        },
        groundLengthMm: { type: 'number' },
        groundWidthMm: { type: 'number' },
        conditions: { type: 'string' },
        frequencyUnit: { type: 'string' },
        valueUnit: { type: 'string' },
        dryRun: { type: 'boolean' },
      },
    },
  })
  @ApiOperation({
    summary:
      'Upload a curve: s11 as Touchstone, the others as CSV; at most 16 MiB (413), text only (415); 422 { code, message, line } for a bad file, and nothing is stored',
  })
  @ApiOkResponse({ type: UploadMeasurementResultDto })
  upload(
    @Param('id', ParseIdPipe) id: number,
    @UploadedFileParam() file: UploadedFile | undefined,
    @Body() body: UploadMeasurementDto,
    @CurrentUser() user: AuthUser,
  ): Promise<UploadMeasurementResultDto> {
    return this.measurements.upload(id, file, body, user);
  }

  @Get(':measurementId/points')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'The parsed points of a measurement (s11 also as VSWR and return loss)' })
  @ApiOkResponse({ type: MeasurementPointsDto })
  points(@Param('id', ParseIdPipe) id: number, @Param('measurementId', ParseIdPipe) measurementId: number): Promise<MeasurementPointsDto> {
    return this.measurements.points(id, measurementId);
  }

  @Get(':measurementId/file')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'The original uploaded file, as text/plain (Touchstone) or text/csv whatever the uploader declared' })
  @Header('X-Content-Type-Options', 'nosniff')
  async file(@Param('id', ParseIdPipe) id: number, @Param('measurementId', ParseIdPipe) measurementId: number): Promise<StreamableFile> {
    return downloadOf(await this.measurements.file(id, measurementId));
  }

  @Delete(':measurementId')
  @Roles('engineer', 'admin')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete a measurement and its file (engineer: own drafts)' })
  remove(@Param('id', ParseIdPipe) id: number, @Param('measurementId', ParseIdPipe) measurementId: number, @CurrentUser() user: AuthUser): Promise<void> {
    return this.measurements.remove(id, measurementId, user);
  }
}
