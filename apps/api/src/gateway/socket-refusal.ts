import type { GatewayRefusalCode } from '@catline/contracts';
import { WsException } from '@nestjs/websockets';

/** A socket event or connection refused, with a stable code and a sentence a person understands. */
export class SocketRefusal extends WsException {
  constructor(
    readonly code: GatewayRefusalCode,
    message: string,
  ) {
    super({ code, message });
    this.message = message;
  }
}
