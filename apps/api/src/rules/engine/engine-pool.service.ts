import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';
import type { CircuitEvaluation } from '@linesmith/routing';
import { Piscina } from 'piscina';
import { AppError } from '../../common/errors/app-error.js';
import { ErrorCode } from '../../common/errors/error-code.js';
import { evaluateTask, type EvaluationAnswer, type EvaluationTask } from './evaluation.worker.js';

/** A circuit over the engine's work budget, or one whose check ran past the time limit: 400, with the counts. */
export class CircuitTooComplexError extends AppError {
  constructor(message: string) {
    super(ErrorCode.CircuitTooComplex, message);
  }
}

const positive = (text: string | undefined, fallback: number) => {
  const n = Number(text);
  return Number.isFinite(n) && n > 0 ? n : fallback;
};

/** Checks a circuit off the event loop; `InlineEngine` (tests) does it in-process. */
export abstract class Engine {
  abstract evaluate(task: EvaluationTask): Promise<CircuitEvaluation>;
}

function answerOf(answer: EvaluationAnswer): CircuitEvaluation {
  if (answer.kind === 'too-complex') throw new CircuitTooComplexError(answer.message);
  return answer.evaluation;
}

/**
 * The rules engine's worker-thread pool (piscina): every API check of a circuit runs here, so the
 * event loop only parses requests and answers them. One thread fewer than the cores by default
 * (`ENGINE_THREADS`), a queue of `ENGINE_QUEUE` checks beyond that (503 when full), and a time
 * limit per check (`ENGINE_TIME_LIMIT_MS`, 10 s): a check still running then is stopped with its
 * thread and answered 400 — the work budget refuses such circuits before they start, so this is
 * the backstop.
 */
@Injectable()
export class EnginePoolService extends Engine implements OnModuleDestroy {
  private readonly logger = new Logger('Engine');
  private readonly pool: Piscina<EvaluationTask, EvaluationAnswer>;
  private readonly timeLimitMs = positive(process.env.ENGINE_TIME_LIMIT_MS, 10_000);

  constructor() {
    super();
    const here = typeof __dirname === 'string' ? __dirname : dirname(fileURLToPath(import.meta.url));
    // The built API ships evaluation.worker.js; from the sources the worker transpiles on load.
    const built = join(here, 'evaluation.worker.js');
    const filename = existsSync(built) ? built : join(here, 'source-worker.mjs');
    const maxThreads = positive(process.env.ENGINE_THREADS, Math.max(1, availableParallelism() - 1));
    this.pool = new Piscina({
      filename: pathToFileURL(filename).href,
      minThreads: 1,
      maxThreads,
      maxQueue: positive(process.env.ENGINE_QUEUE, 64),
      idleTimeout: 60_000,
    });
  }

  async evaluate(task: EvaluationTask): Promise<CircuitEvaluation> {
    try {
      return answerOf(await this.pool.run(task, { signal: AbortSignal.timeout(this.timeLimitMs) }));
    } catch (error) {
      if (error instanceof AppError) throw error;
      const name = error instanceof Error ? error.name : '';
      const message = error instanceof Error ? error.message : String(error);
      if (name === 'AbortError' || name === 'TimeoutError') {
        throw new CircuitTooComplexError(
          `This circuit is too complex to check: its check ran past the ${this.timeLimitMs / 1000} s limit. Simplify the heat zones or the routes near them.`,
        );
      }
      if (/queue is at limit/i.test(message)) throw new AppError(ErrorCode.Unavailable, 'The rules engine is busy. Please try again shortly.');
      this.logger.error(message);
      throw error;
    }
  }

  async onModuleDestroy(): Promise<void> {
    await this.pool.destroy();
  }
}

/** The same check on the calling thread: for unit tests, which need no threads. */
export class InlineEngine extends Engine {
  async evaluate(task: EvaluationTask): Promise<CircuitEvaluation> {
    return answerOf(evaluateTask(structuredClone(task)));
  }
}
