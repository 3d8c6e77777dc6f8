import { Body, Controller, HttpCode, Post, UploadedFile, UseInterceptors } from '@nestjs/common';
import { ApiBody, ApiConsumes, ApiOkResponse, ApiOperation, ApiPayloadTooLargeResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import { Roles } from '../common/auth.decorators';
import { ALL_ROLES } from '../common/roles';
import { AnalyzeTouchstoneDto, AnalyzeTouchstoneFormDto, TouchstoneAnalysisDto } from './dto/analyze-touchstone.dto';
import { ConversionRequestDto, ConversionResponseDto } from './dto/conversions.dto';
import { LinkBudgetRequestDto, LinkBudgetResponseDto } from './dto/link-budget.dto';
import { MatchingRequestDto, MatchingResponseDto } from './dto/matching.dto';
import { RfToolsService, type UploadedTouchstone } from './rf-tools.service';
import { TOUCHSTONE_MAX_BYTES } from '../rf/touchstone';
import { LimitedFileUpload } from '../storage/limited-file-upload';

@ApiTags('rf')
@Controller('rf')
export class RfToolsController {
  constructor(private readonly rf: RfToolsService) {}

  @Post('touchstone/analyze')
  @Roles(...ALL_ROLES)
  @HttpCode(200)
  @UseInterceptors(LimitedFileUpload(TOUCHSTONE_MAX_BYTES, 'TOUCHSTONE_TOO_LARGE', 'a Touchstone file'))
  @ApiOperation({
    summary: 'Read a Touchstone file and report its matched ranges and best match',
    description:
      'Multipart field `file` (.s1p/.s2p: the extension must agree with the file; .ts: version 2), at most UPLOAD_MAX_MB (25 MiB by default, never above 32 MiB), 250,000 points and 8 KiB a line. ' +
      'Matched ranges and the best match use every point of the file; `curve` is for plotting and is resampled to 2000 points for longer files. Nothing is stored.',
  })
  @ApiConsumes('multipart/form-data')
  @ApiBody({ type: AnalyzeTouchstoneFormDto })
  @ApiOkResponse({ type: TouchstoneAnalysisDto })
  @ApiUnprocessableEntityResponse({ description: 'A bad file: `{ code, message, line }` with the 1-based line, or null for the file as a whole' })
  @ApiPayloadTooLargeResponse({ description: 'Over the limit: code TOUCHSTONE_TOO_LARGE with limitBytes' })
  analyzeTouchstone(@UploadedFile() file: UploadedTouchstone | undefined, @Body() body: AnalyzeTouchstoneDto): TouchstoneAnalysisDto {
    return this.rf.analyzeTouchstone(file, body);
  }

  @Post('matching')
  @Roles(...ALL_ROLES)
  @HttpCode(200)
  @ApiOperation({
    summary: 'L-section matching starting point: every solution, exact and snapped to E12/E24, with return loss over the sweep',
    description: 'Lossless L-section (Pozar §5.1). The load is taken as constant over the sweep, so the sweep is a first estimate only.',
  })
  @ApiOkResponse({ type: MatchingResponseDto })
  matching(@Body() body: MatchingRequestDto): MatchingResponseDto {
    return this.rf.matching(body);
  }

  @Post('link-budget')
  @Roles(...ALL_ROLES)
  @HttpCode(200)
  @ApiOperation({ summary: 'Free-space link budget: EIRP, ERP, Friis path loss, received power, margin and the range where the margin reaches 0 dB' })
  @ApiOkResponse({ type: LinkBudgetResponseDto })
  linkBudget(@Body() body: LinkBudgetRequestDto): LinkBudgetResponseDto {
    return this.rf.linkBudget(body);
  }

  @Post('conversions')
  @Roles(...ALL_ROLES)
  @HttpCode(200)
  @ApiOperation({
    summary: 'Convert one known RF quantity into its related ones',
    description:
      'Give exactly one of: vswr, returnLossDb, gammaMagnitude, impedanceOhms (+ optional z0Ohms, default 50 Ω), frequencyHz, dbm, mw, efficiencyPct, efficiencyDb.',
  })
  @ApiOkResponse({ type: ConversionResponseDto })
  convert(@Body() body: ConversionRequestDto): ConversionResponseDto {
    return this.rf.convert(body);
  }
}
