import { Controller, Get, Header, Param, StreamableFile } from '@nestjs/common';
import { ApiOperation, ApiProduces, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../common/auth.decorators';
import { ParseIdPipe } from '../common/parse-id.pipe';
import { ALL_ROLES } from '../common/roles';
import { downloadOf } from '../storage/file-response';
import { ReportsService } from './reports.service';

@ApiTags('reports')
@Controller('products/:id')
export class ReportsController {
  constructor(private readonly reports: ReportsService) {}

  @Get('report.pdf')
  @Roles(...ALL_ROLES)
  @ApiProduces('application/pdf')
  @Header('Cache-Control', 'no-store')
  @ApiOperation({
    summary:
      'A dated PDF report of the product for a design review: markets, each radio with its verdict, chosen part and bands with reasons and facts, the rules applied, the cautions and a sign-off block',
  })
  async productReport(@Param('id', ParseIdPipe) id: number, @CurrentUser() user: AuthUser): Promise<StreamableFile> {
    return downloadOf(await this.reports.productReport(id, user));
  }
}
