import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsDefined, IsObject, ValidateNested } from 'class-validator';
import type { ReplaceRulesRequest } from '@lockstep/shared';
import { ApiProperty } from '@nestjs/swagger';
import { LimitRuleInputDto } from './limit-rule-input.dto.js';

export class ReplaceRulesDto implements ReplaceRulesRequest {
  @ValidateNested({ each: true })
  @Type(() => LimitRuleInputDto)
  // ValidateNested alone walks into a nested list ([[]]) and finds nothing wrong with it.
  @ApiProperty({ type: () => [LimitRuleInputDto], maxItems: 500, description: 'Every rule of the draft, replacing the ones it had' })
  @IsObject({ each: true, message: 'Each rule must be an object' })
  @ArrayMaxSize(500, { message: 'A library version holds at most 500 rules' })
  @IsArray({ message: 'rules must be a list' })
  @IsDefined({ message: 'rules is required' })
  rules: LimitRuleInputDto[];
}
