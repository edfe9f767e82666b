/**
 * Pins whose touch targets would overlap on screen are spread apart, so each can be tapped and
 * dragged: every group of pins closer than one target to each other is laid out on a small ring
 * round its centre (screen pixels; the pins' positions on the ground do not change).
 * Common practice for map markers ("spiderfying"), no published source.
 */
export type ScreenPin = { key: string; x: number; y: number };

export function spreadOffsets(pins: ScreenPin[], targetPx = 44): Record<string, [number, number]> {
  const offsets: Record<string, [number, number]> = {};
  const left = [...pins];
  while (left.length) {
    // A group: the first pin left and, transitively, every pin within one target of the group.
    const group = [left.shift()!];
    for (let i = 0; i < group.length; i++) {
      for (let j = left.length - 1; j >= 0; j--) {
        if (Math.hypot(left[j].x - group[i].x, left[j].y - group[i].y) < targetPx) group.push(...left.splice(j, 1));
      }
    }
    if (group.length === 1) {
      offsets[group[0].key] = [0, 0];
      continue;
    }
    // On a ring whose chord between neighbours is one target: r = target / (2 sin(π / n)).
    const radius = targetPx / (2 * Math.sin(Math.PI / group.length));
    const cx = group.reduce((s, p) => s + p.x, 0) / group.length;
    const cy = group.reduce((s, p) => s + p.y, 0) / group.length;
    const ordered = [...group].sort((a, b) => a.key.localeCompare(b.key));
    ordered.forEach((p, i) => {
      const angle = -Math.PI / 2 + (2 * Math.PI * i) / group.length;
      offsets[p.key] = [Math.round(cx + radius * Math.cos(angle) - p.x), Math.round(cy + radius * Math.sin(angle) - p.y)];
    });
  }
  return offsets;
}
