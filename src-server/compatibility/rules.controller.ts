import { Body, Controller, Get, HttpCode, Param, Post, Put } from '@nestjs/common';
import { ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../common/auth.decorators';
import { RulePreviewService } from './rule-preview.service';
import {
  PreviewRuleDto,
  RuleDefinitionBodyDto,
  RuleDetailDto,
  RulePreviewDto,
  RuleSummaryDto,
  RuleValidationDto,
  RuleVersionDto,
  SetRuleEnabledDto,
  UpdateRuleDto,
} from './dto/rule.dto';
import { ParseRuleIdPipe } from './rule-id.pipe';
import { RulesService } from './rules.service';

@ApiTags('rules')
@Controller('rules')
export class RulesController {
  constructor(
    private readonly rules: RulesService,
    private readonly rulePreview: RulePreviewService,
  ) {}

  @Get()
  @Roles('admin', 'engineer')
  @ApiOperation({ summary: 'The rule set: file rules, admin edits and admin-made rules (admin, engineer)' })
  @ApiOkResponse({ type: [RuleSummaryDto] })
  list(): Promise<RuleSummaryDto[]> {
    return this.rules.list();
  }

  @Post('validation')
  @Roles('admin')
  @HttpCode(200)
  @ApiOperation({ summary: "Check a rule against json-rules-engine's shape and our fact names without saving it (admin)" })
  @ApiOkResponse({ type: RuleValidationDto })
  validate(@Body() body: RuleDefinitionBodyDto): RuleValidationDto {
    return this.rules.validate(body.definition);
  }

  @Post('preview')
  @Roles('admin')
  @HttpCode(200)
  @ApiOperation({ summary: 'Which matrix cells of which products would change if this rule were saved (admin)' })
  @ApiOkResponse({ type: RulePreviewDto })
  preview(@Body() body: PreviewRuleDto): Promise<RulePreviewDto> {
    return this.rulePreview.previewRule(body.definition);
  }

  @Post()
  @Roles('admin')
  @ApiOperation({ summary: 'Create a rule; it is validated before it is saved (admin)' })
  @ApiCreatedResponse({ type: RuleDetailDto })
  create(@Body() body: RuleDefinitionBodyDto, @CurrentUser() actor: AuthUser): Promise<RuleDetailDto> {
    return this.rules.create(body.definition, actor);
  }

  @Get(':ruleId')
  @Roles('admin', 'engineer')
  @ApiOperation({ summary: 'One rule with its JSON (admin, engineer)' })
  @ApiOkResponse({ type: RuleDetailDto })
  get(@Param('ruleId', ParseRuleIdPipe) ruleId: string): Promise<RuleDetailDto> {
    return this.rules.get(ruleId);
  }

  @Put(':ruleId')
  @Roles('admin')
  @ApiOperation({ summary: 'Edit a rule; validated before saving, saved as a new version (admin)' })
  @ApiOkResponse({ type: RuleDetailDto })
  update(@Param('ruleId', ParseRuleIdPipe) ruleId: string, @Body() body: UpdateRuleDto, @CurrentUser() actor: AuthUser): Promise<RuleDetailDto> {
    return this.rules.update(ruleId, body.definition, body.version, actor);
  }

  @Put(':ruleId/enabled')
  @Roles('admin')
  @ApiOperation({ summary: 'Enable or disable a rule (admin)' })
  @ApiOkResponse({ type: RuleDetailDto })
  setEnabled(@Param('ruleId', ParseRuleIdPipe) ruleId: string, @Body() body: SetRuleEnabledDto, @CurrentUser() actor: AuthUser): Promise<RuleDetailDto> {
    return this.rules.setEnabled(ruleId, body.enabled, body.version, actor);
  }

  @Get(':ruleId/versions')
  @Roles('admin', 'engineer')
  @ApiOperation({ summary: "A rule's version history, newest first (admin, engineer)" })
  @ApiOkResponse({ type: [RuleVersionDto] })
  versions(@Param('ruleId', ParseRuleIdPipe) ruleId: string): Promise<RuleVersionDto[]> {
    return this.rules.versions(ruleId);
  }
}
