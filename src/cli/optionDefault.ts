/** Commander options whose help shows the default as written (`default: text`), never as JSON. */
import { Option } from 'commander';

/** An option with a default value and the text its help shows for it. */
export function withDefault<T>(flags: string, description: string, value: T, shown: string, parse?: (text: string) => T): Option {
  const option = new Option(flags, description).default(value, shown);
  return parse ? option.argParser(parse) : option;
}
