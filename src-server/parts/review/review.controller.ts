import { Body, Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiOkResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ParseIdPipe } from '../../common/parse-id.pipe';
import { ALL_ROLES } from '../../common/roles';
import { ReviewService } from './review.service';
import { ReviewActionDto } from '../dto/part-input.dto';
import { PartDetailDto, ReviewQueueItemDto } from '../dto/part-response.dto';
import { PartConsistencyDto } from '../dto/consistency.dto';

@ApiTags('part review')
@Controller('parts')
export class ReviewController {
  constructor(private readonly review: ReviewService) {}

  @Get('review-queue')
  @Roles('admin')
  @ApiOperation({ summary: 'Parts waiting for review, oldest submission first (admin)' })
  @ApiOkResponse({ type: [ReviewQueueItemDto] })
  queue(): Promise<ReviewQueueItemDto[]> {
    return this.review.queue();
  }

  @Get(':id/consistency')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: "A part's datasheet claims against its measurements, what is missing, and the directivity its gain and efficiency imply" })
  @ApiOkResponse({ type: PartConsistencyDto })
  consistency(@Param('id', ParseIdPipe) id: number): Promise<PartConsistencyDto> {
    return this.review.consistency(id);
  }

  @Post(':id/submission')
  @Roles('engineer', 'admin')
  @HttpCode(200)
  @ApiOperation({ summary: 'Submit a draft for review; e-mails the admins (engineer: own drafts)' })
  @ApiOkResponse({ type: PartDetailDto })
  submit(@Param('id', ParseIdPipe) id: number, @Body() body: ReviewActionDto, @CurrentUser() user: AuthUser): Promise<PartDetailDto> {
    return this.review.transition(id, 'submit', body, user);
  }

  @Post(':id/approval')
  @Roles('admin')
  @HttpCode(200)
  @ApiOperation({ summary: 'Approve a part in review; e-mails the submitter (admin)' })
  @ApiOkResponse({ type: PartDetailDto })
  approve(@Param('id', ParseIdPipe) id: number, @Body() body: ReviewActionDto, @CurrentUser() user: AuthUser): Promise<PartDetailDto> {
    return this.review.transition(id, 'approve', body, user);
  }

  @Post(':id/rejection')
  @Roles('admin')
  @HttpCode(200)
  @ApiOperation({ summary: 'Reject a part in review back to draft with a comment; e-mails the submitter (admin)' })
  @ApiOkResponse({ type: PartDetailDto })
  reject(@Param('id', ParseIdPipe) id: number, @Body() body: ReviewActionDto, @CurrentUser() user: AuthUser): Promise<PartDetailDto> {
    return this.review.transition(id, 'reject', body, user);
  }

  @Post(':id/restriction')
  @Roles('admin')
  @HttpCode(200)
  @ApiOperation({ summary: 'Restrict an approved part, with a comment (admin)' })
  @ApiOkResponse({ type: PartDetailDto })
  restrict(@Param('id', ParseIdPipe) id: number, @Body() body: ReviewActionDto, @CurrentUser() user: AuthUser): Promise<PartDetailDto> {
    return this.review.transition(id, 'restrict', body, user);
  }

  @Post(':id/reinstatement')
  @Roles('admin')
  @HttpCode(200)
  @ApiOperation({ summary: 'Lift a restriction: back to approved (admin)' })
  @ApiOkResponse({ type: PartDetailDto })
  reinstate(@Param('id', ParseIdPipe) id: number, @Body() body: ReviewActionDto, @CurrentUser() user: AuthUser): Promise<PartDetailDto> {
    return this.review.transition(id, 'reinstate', body, user);
  }

  @Post(':id/retirement')
  @Roles('admin')
  @HttpCode(200)
  @ApiOperation({ summary: 'Retire an approved or restricted part (admin)' })
  @ApiOkResponse({ type: PartDetailDto })
  retire(@Param('id', ParseIdPipe) id: number, @Body() body: ReviewActionDto, @CurrentUser() user: AuthUser): Promise<PartDetailDto> {
    return this.review.transition(id, 'retire', body, user);
  }
}
