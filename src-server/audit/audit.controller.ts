import { Controller, Get, Query } from '@nestjs/common';
import { ApiOperation, ApiTags } from '@nestjs/swagger';
import { Roles } from '../common/auth.decorators';
import { AuditService } from './audit.service';
import { AuditQueryDto } from './dto/audit-query.dto';

@ApiTags('audit')
@Controller('audit')
export class AuditController {
  constructor(private readonly audit: AuditService) {}

  @Get()
  @Roles('admin')
  @ApiOperation({ summary: 'The audit log, newest first (admin)' })
  list(@Query() query: AuditQueryDto) {
    return this.audit.list(query, { withEmails: true });
  }
}
