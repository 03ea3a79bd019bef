import { describe, expect, it } from "vitest";
import { fillCellExpiry } from "../../../server/modules/maps/maps.jobs";
import { DEFAULT_QUEUE_POLICIES } from "../../../server/queue/boss";
import { FILL_CELL_QUEUE } from "../../../server/queue/queues";

describe("fillCellExpiry", () => {
  const queueDefault = DEFAULT_QUEUE_POLICIES[FILL_CELL_QUEUE].expireInSeconds;

  it("keeps the queue's own expiry for cells estimated well within it", () => {
    expect(fillCellExpiry(undefined)).toBeUndefined();
    expect(fillCellExpiry(1)).toBeUndefined();
    expect(fillCellExpiry(queueDefault / 3)).toBeUndefined();
  });

  it("gives a big cell three times its estimated cost", () => {
    expect(fillCellExpiry(queueDefault)).toBe(3 * queueDefault);
    expect(fillCellExpiry(2 * 3600.2)).toBe(Math.ceil(3 * 2 * 3600.2));
  });
});
