import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

/** One field that failed validation. */
export class FieldErrorDto {
  @ApiProperty({ example: 'email', description: 'Dotted path of the field in the request body or query' })
  field: string;

  @ApiProperty({ example: ['email must be an email address'] })
  messages: string[];
}

/** The one shape of every error the API answers with. */
export class ErrorResponseDto {
  @ApiProperty({ example: 400 })
  statusCode: number;

  @ApiProperty({ example: 'Bad Request', description: 'The HTTP status text' })
  error: string;

  @ApiProperty({ example: 'Validation failed: property nickname should not exist' })
  message: string;

  @ApiPropertyOptional({ type: FieldErrorDto, isArray: true })
  details?: FieldErrorDto[];

  @ApiProperty({ example: '3f0c8f5e-3c55-4d8e-9a51-8c3f1f3a9d27', description: 'Also in the X-Request-Id response header and the logs' })
  requestId: string;

  @ApiProperty({ example: '/api/users' })
  path: string;

  @ApiProperty({ type: String, format: 'date-time' })
  timestamp: string;
}
