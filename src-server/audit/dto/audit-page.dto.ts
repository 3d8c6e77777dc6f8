import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

export class AuditUserDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
  @ApiPropertyOptional({ description: "Only in the admins' audit log" }) email?: string;
}

/** One audit entry, as the audit log and every history route answer it. */
export class AuditEntryDto {
  @ApiProperty() id: string;
  @ApiProperty({ example: 'part' }) entityType: string;
  @ApiProperty() entityId: string;
  @ApiProperty({ example: 'updated' }) action: string;
  @ApiPropertyOptional({ type: AuditUserDto, nullable: true, description: 'Who did it; null for the system' }) user: AuditUserDto | null;
  @ApiProperty({
    type: 'object',
    additionalProperties: true,
    description: 'Changed fields as { field: [before, after] }, or what was created or removed',
  })
  changes: Record<string, unknown>;
  @ApiProperty({ description: 'When (ISO 8601)' }) at: string;
}

/** One page of entries, newest first, and how many there are in all. */
export class AuditPageDto {
  @ApiProperty({ type: [AuditEntryDto] }) items: AuditEntryDto[];
  @ApiProperty() total: number;
}
