import { ApiProperty } from '@nestjs/swagger';
import type { LoginRequest } from '@yardcall/shared';
import { IsEmail, IsString, MaxLength, MinLength } from 'class-validator';

export class LoginDto implements LoginRequest {
  @ApiProperty({ example: 'driver@yardcall.test' })
  @IsEmail({}, { message: 'Enter your e-mail address, e.g. name@example.com.' })
  @MaxLength(254, { message: 'An e-mail address has at most 254 characters.' })
  email: string;

  @ApiProperty({ example: 'yardcall-demo' })
  @IsString({ message: 'Enter your password.' })
  @MinLength(1, { message: 'Enter your password.' })
  @MaxLength(200, { message: 'A password has at most 200 characters.' })
  password: string;
}
