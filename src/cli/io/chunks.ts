/**
 * The streaming loop shared by the CSV and JSON Lines readers: feed text or
 * UTF-8 byte chunks to an incremental parser and yield what it emits as soon
 * as each chunk has been parsed, so memory stays flat in the input length.
 *
 * @internal
 */

/** An incremental parser that reports items through the sink it was built with. */
export interface IncrementalParser {
  push(text: string): void;
  end(): void;
}

/**
 * Run `makeParser(sink)` over every chunk of `source` and yield the items it
 * emits. Byte chunks are decoded as UTF-8 with a streaming decoder, so a
 * multi-byte character split across chunks is handled.
 */
export async function* parseChunks<T>(
  source: AsyncIterable<string | Uint8Array>,
  makeParser: (sink: (item: T) => void) => IncrementalParser,
): AsyncGenerator<T, void, undefined> {
  let batch: T[] = [];
  const parser = makeParser((item) => batch.push(item));
  let decoder: TextDecoder | null = null;
  for await (const chunk of source) {
    if (typeof chunk === "string") {
      parser.push(chunk);
    } else {
      decoder ??= new TextDecoder("utf-8");
      parser.push(decoder.decode(chunk, { stream: true }));
    }
    if (batch.length > 0) {
      const b = batch;
      batch = [];
      yield* b;
    }
  }
  if (decoder !== null) parser.push(decoder.decode());
  parser.end();
  yield* batch;
}
