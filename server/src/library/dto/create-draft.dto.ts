import { IsDefined, IsInt, IsOptional, IsPositive, IsString, MaxLength } from 'class-validator';

export class CreateDraftDto {
  @IsPositive({ message: 'wardId must be positive' })
  @IsInt({ message: 'wardId must be a whole number' })
  @IsDefined({ message: 'wardId is required' })
  wardId: number;

  @MaxLength(1000, { message: 'The note is at most 1,000 characters' })
  @IsString({ message: 'note must be text' })
  @IsOptional()
  note?: string;
}
