import { Body, Controller, Delete, Get, Param, Post, Put, Query, Res } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { ALL_ROLES } from '../common/roles';
import { type AuthUser, CurrentUser, Roles } from '../common/auth.decorators';
import { ParseIdPipe } from '../common/parse-id.pipe';
import { AssignmentsService } from './assignments.service';
import { CandidatesService } from './candidates.service';
import { MatrixService, type MatrixSelection } from './matrix.service';
import { EvaluationService } from './evaluation.service';
import { BillOfMaterialsService } from './bill-of-materials.service';
import { BillOfMaterialsDto, BillOfMaterialsQueryDto, ProductEvaluationDto } from './dto/evaluation.dto';
import { matrixCsvFileName, matrixToCsv } from './matrix-csv';
import { coexistenceCsvFileName, coexistenceToCsv } from './coexistence-csv';
import { AssignmentDto, CandidatesDto, CandidatesQueryDto, ChoosePartDto, MatrixDto, MatrixQueryDto, ShortlistDto } from './dto/matrix.dto';
import { AuditPageDto } from '../audit/dto/audit-page.dto';

const matrixSelection = (query: MatrixQueryDto): MatrixSelection => ({
  partIds: query.parts ? [...new Set(query.parts.split(',').map(Number))] : undefined,
  chosenOnly: query.chosenOnly,
});

@ApiTags('compatibility')
@Controller('products/:id')
export class CompatibilityController {
  constructor(
    private readonly matrices: MatrixService,
    private readonly ranking: CandidatesService,
    private readonly partAssignments: AssignmentsService,
    private readonly evaluations: EvaluationService,
    private readonly bom: BillOfMaterialsService,
  ) {}

  @Get('evaluation')
  @Roles(...ALL_ROLES)
  @ApiOperation({
    summary:
      "The product's verdict and, per radio, its verdict from its chosen part: each band's verdict, deciding finding and facts. Worst first: fail, then no-data (a radio not checked cannot pass), then marginal, then pass",
  })
  @ApiOkResponse({ type: ProductEvaluationDto })
  evaluation(@Param('id', ParseIdPipe) id: number): Promise<ProductEvaluationDto> {
    return this.evaluations.evaluate(id);
  }

  @Get('bill-of-materials')
  @Roles(...ALL_ROLES)
  @ApiOperation({
    summary:
      "The chosen parts with the unit price at the build quantity (from the offers' price breaks), lead time, and the antenna cost per product (one total per currency when mixed)",
  })
  @ApiOkResponse({ type: BillOfMaterialsDto })
  billOfMaterials(@Param('id', ParseIdPipe) id: number, @Query() query: BillOfMaterialsQueryDto): Promise<BillOfMaterialsDto> {
    return this.bom.billOfMaterials(id, query.quantity, query.currency);
  }

  @Get('matrix')
  @Roles(...ALL_ROLES)
  @ApiOperation({
    summary:
      "Each radio's bands against that radio's own chosen and shortlisted parts (chosenOnly: its chosen part; parts: the asked parts on every band), with each cell's findings",
  })
  @ApiOkResponse({ type: MatrixDto })
  matrix(@Param('id', ParseIdPipe) id: number, @Query() query: MatrixQueryDto): Promise<MatrixDto> {
    return this.matrices.matrix(id, matrixSelection(query));
  }

  @Get('matrix.csv')
  @Roles(...ALL_ROLES)
  @ApiProduces('text/csv')
  @ApiOperation({ summary: 'The same matrix as CSV: one line per radio band and part, with the screening caution first' })
  async matrixCsv(@Param('id', ParseIdPipe) id: number, @Query() query: MatrixQueryDto, @Res({ passthrough: true }) response: Response): Promise<string> {
    const matrix = await this.matrices.matrix(id, matrixSelection(query));
    const text = matrixToCsv(matrix);
    // Set only once the file exists: an error before it must still answer as JSON.
    response.setHeader('Content-Type', 'text/csv; charset=utf-8');
    response.setHeader('Content-Disposition', `attachment; filename="${matrixCsvFileName(matrix.productName)}"`);
    return text;
  }

  @Get('coexistence.csv')
  @Roles(...ALL_ROLES)
  @ApiProduces('text/csv')
  @ApiOperation({
    summary:
      "The product's coexistence findings as CSV: one line per harmonic, intermodulation product or transmit edge on another radio's receive range, with the isolation it needs",
  })
  async coexistenceCsv(@Param('id', ParseIdPipe) id: number, @Res({ passthrough: true }) response: Response): Promise<string> {
    const { productName, radioNames, findings } = await this.evaluations.coexistence(id);
    const text = coexistenceToCsv(productName, radioNames, findings);
    response.setHeader('Content-Type', 'text/csv; charset=utf-8');
    response.setHeader('Content-Disposition', `attachment; filename="${coexistenceCsvFileName(productName)}"`);
    return text;
  }

  @Get('radios/:radioId/candidates')
  @Roles(...ALL_ROLES)
  @ApiOperation({
    summary:
      "Approved parts for one radio, ranked by status, then by fit to the radio's feed and polarization, then by the margin to their nearest limit; each explained by the finding that decides its rank, with its price at the build quantity and lead time",
  })
  @ApiOkResponse({ type: CandidatesDto })
  candidates(@Param('id', ParseIdPipe) id: number, @Param('radioId', ParseIdPipe) radioId: number, @Query() query: CandidatesQueryDto): Promise<CandidatesDto> {
    return this.ranking.candidates(id, radioId, query);
  }

  @Get('assignments')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'The shortlisted and chosen parts of every radio of the product' })
  @ApiOkResponse({ type: [AssignmentDto] })
  assignments(@Param('id', ParseIdPipe) id: number): Promise<AssignmentDto[]> {
    return this.partAssignments.listAssignments(id);
  }

  @Get('assignments/history')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'Who shortlisted, chose or removed which part, newest first' })
  @ApiOkResponse({ type: AuditPageDto })
  history(@Param('id', ParseIdPipe) id: number): Promise<AuditPageDto> {
    return this.partAssignments.history(id);
  }

  @Post('radios/:radioId/shortlist')
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: 'Shortlist a part for a radio (engineer, admin)' })
  @ApiOkResponse({ type: [AssignmentDto] })
  shortlist(
    @Param('id', ParseIdPipe) id: number,
    @Param('radioId', ParseIdPipe) radioId: number,
    @Body() body: ShortlistDto,
    @CurrentUser() actor: AuthUser,
  ): Promise<AssignmentDto[]> {
    return this.partAssignments.shortlist(id, radioId, body.partId, body.note, actor);
  }

  @Delete('radios/:radioId/shortlist/:partId')
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: "Take a part off a radio's shortlist (and its choice, if it was chosen) (engineer, admin)" })
  @ApiOkResponse({ type: [AssignmentDto] })
  unshortlist(
    @Param('id', ParseIdPipe) id: number,
    @Param('radioId', ParseIdPipe) radioId: number,
    @Param('partId', ParseIdPipe) partId: number,
    @CurrentUser() actor: AuthUser,
  ): Promise<AssignmentDto[]> {
    return this.partAssignments.removeFromShortlist(id, radioId, partId, actor);
  }

  @Put('radios/:radioId/choice')
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: 'Choose the part for a radio; the previous choice returns to the shortlist (engineer, admin)' })
  @ApiOkResponse({ type: [AssignmentDto] })
  choose(
    @Param('id', ParseIdPipe) id: number,
    @Param('radioId', ParseIdPipe) radioId: number,
    @Body() body: ChoosePartDto,
    @CurrentUser() actor: AuthUser,
  ): Promise<AssignmentDto[]> {
    return this.partAssignments.choose(id, radioId, body.partId, actor, body.role);
  }

  @Delete('radios/:radioId/choice')
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: 'Clear the choice of a radio; the part stays shortlisted (engineer, admin)' })
  @ApiOkResponse({ type: [AssignmentDto] })
  clearChoice(@Param('id', ParseIdPipe) id: number, @Param('radioId', ParseIdPipe) radioId: number, @CurrentUser() actor: AuthUser): Promise<AssignmentDto[]> {
    return this.partAssignments.clearChoice(id, radioId, actor);
  }
}
