// The smallest Nest app: one GET route answering "hello". The yardstick between bare node:http
// and our app with all its middleware. Plain JS, decorators applied by hand.
import 'reflect-metadata';
import { Controller, Get, Module } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';

class HelloController {
  hello() {
    return 'hello';
  }
}
const descriptor = /** @type {PropertyDescriptor} */ (
  Object.getOwnPropertyDescriptor(HelloController.prototype, 'hello')
);
Reflect.decorate([Get()], HelloController.prototype, 'hello', descriptor);
Reflect.decorate([Controller('hello')], HelloController);

class HelloModule {}
Reflect.decorate([Module({ controllers: [HelloController] })], HelloModule);

const app = await NestFactory.create(HelloModule, { logger: false });
await app.listen(Number(process.env.PORT ?? 3201), '127.0.0.1');
process.send?.('ready');
