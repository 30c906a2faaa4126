import { Reflector } from '@nestjs/core';
import { ROLES_KEY } from '../auth/decorators/roles.decorator.js';
import { CircuitReviewController } from './circuit-review.controller.js';
import { ReviewsController } from './reviews.controller.js';

/** Who may call each handler, as declared by `@Roles` (the global RolesGuard enforces it). */
describe('review controllers: roles', () => {
  const reflector = new Reflector();
  const rolesOf = (handler: (...args: never[]) => unknown) => reflector.get<string[] | undefined>(ROLES_KEY, handler);
  const circuit = CircuitReviewController.prototype;

  it('lets fabricators and admins submit; reviewers and admins decide and read the queue', () => {
    expect(rolesOf(circuit.submit)).toEqual(['fabricator', 'admin']);
    for (const handler of [circuit.acknowledge, circuit.approve, circuit.returnToFabricator, ReviewsController.prototype.queue]) {
      expect(rolesOf(handler)).toEqual(['reviewer', 'admin']);
    }
  });

  it('leaves the review and the comparison readable by everyone in the shop', () => {
    expect(rolesOf(circuit.get)).toBeUndefined();
    expect(rolesOf(circuit.compare)).toBeUndefined();
  });
});
