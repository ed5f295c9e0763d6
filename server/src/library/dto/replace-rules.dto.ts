import { Type } from 'class-transformer';
import { ArrayMaxSize, IsArray, IsDefined, ValidateNested } from 'class-validator';
import { LimitRuleInputDto } from './limit-rule-input.dto.js';

export class ReplaceRulesDto {
  @ValidateNested({ each: true })
  @Type(() => LimitRuleInputDto)
  @ArrayMaxSize(500, { message: 'A library version holds at most 500 rules' })
  @IsArray({ message: 'rules must be a list' })
  @IsDefined({ message: 'rules is required' })
  rules: LimitRuleInputDto[];
}
