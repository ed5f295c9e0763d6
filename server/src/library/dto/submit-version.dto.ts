import { IsOptional, IsString, MaxLength } from 'class-validator';

export class SubmitVersionDto {
  @MaxLength(1000, { message: 'The note is at most 1,000 characters' })
  @IsString({ message: 'note must be text' })
  @IsOptional()
  note?: string;
}
