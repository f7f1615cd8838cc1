/** The part of saxen's API the worksheet reader uses (saxen ships no type declarations). */
declare module 'saxen' {
  export class Parser {
    constructor(options?: { proxy?: boolean });
    on(event: string, handler: (...args: never[]) => void): this;
    write(xml: string): this;
    end(): Error | null;
    parse(xml: string): Error | null;
  }
  export function decode(text: string): string;
}
