import {describe, expect, it} from 'vitest';
import type {CycleResult} from '../../../src/analyse/types.js';
import {cyclePhaseRule} from '../../../src/narrate/callouts/cyclePhase.js';
import {turningPointsRule} from '../../../src/narrate/callouts/turningPoints.js';
import {makeAnalysis, runRule} from '../fixtures.js';

function cycleOf(gap: number[], over: Partial<CycleResult> = {}): CycleResult {
  return {
    method: 'hp',
    trend: gap.map(() => 100),
    gap,
    phase: 'rising-above',
    phaseLabel: '',
    direction: 'rising',
    turningPoints: [],
    periodsSinceTurn: null,
    amplitudeRatio: null,
    stationarity: null,
    options: {},
    ...over,
  };
}

describe('cycle-phase rule', () => {
  it('states the phase and the gap', () => {
    const gap = [-1, -0.5, 0, 0.5, 1, 1.5, 1.8];
    const [d] = runRule(cyclePhaseRule, makeAnalysis(gap, {cycle: cycleOf(gap)}));
    expect(d.text).toBe('For Net sales, the cycle is above trend and rising: the gap to the long-run trend is +1.8%.');
    expect(d.chart).toBe('chart-net-sales-cycle');
  });

  it('says "on trend" for a gap that never moves, as the commentary and the tables do', () => {
    const gap = [0, 0, 0, 0, 0, 0, 0];
    const cycle = cycleOf(gap, {phase: 'rising-above', phaseLabel: 'on trend, no cycle to speak of'});
    const [d] = runRule(cyclePhaseRule, makeAnalysis(gap, {cycle}));
    expect(d.text).toBe('For Net sales, the cycle is on trend, no cycle to speak of: the gap to the long-run trend is 0.0%.');
  });

  it('reports a change of phase in the review period', () => {
    const gap = [-1, -0.5, 0, 0.5, 1, 2, 1.8];
    const [d] = runRule(cyclePhaseRule, makeAnalysis(gap, {cycle: cycleOf(gap, {phase: 'falling-above'})}));
    expect(d.text).toBe(
      'For Net sales, the cycle moved from above trend and rising to above trend and easing in October 2026; the gap to the long-run trend is +1.8%.',
    );
    expect(d.severity).toBe('info'); // a change of direction only
  });

  it('marks a crossing of the long-run trend as watch', () => {
    const gap = [1, 0.8, 0.6, 0.4, 0.2, 0.1, -0.3];
    const [d] = runRule(cyclePhaseRule, makeAnalysis(gap, {cycle: cycleOf(gap, {phase: 'falling-below'})}));
    expect(d.text).toBe(
      'For Net sales, the cycle moved from above trend and easing to below trend and falling in October 2026; the gap to the long-run trend is -0.3%.',
    );
    expect(d.severity).toBe('watch');
  });
});

describe('turning-point rule', () => {
  const gap = new Array<number>(36).fill(0);
  it('reports recent turning points, provisional ones flagged, with singular and plural periods', () => {
    const cycle = cycleOf(gap, {
      turningPoints: [
        {index: 2, type: 'trough', provisional: false}, // 33 months ago: older than two years, left out
        {index: 21, type: 'peak', provisional: false},
        {index: 34, type: 'trough', provisional: true},
      ],
    });
    const drafts = runRule(turningPointsRule, makeAnalysis(gap, {cycle}));
    expect(drafts.map((d) => d.text)).toEqual([
      'The cycle of Net sales passed a peak in August 2025, 14 months ago.',
      'The cycle of Net sales may have passed a trough in September 2026, 1 month ago (provisional: later data can still move or remove it).',
    ]);
    expect(drafts.map((d) => d.severity)).toEqual(['info', 'watch']);
    expect(drafts.map((d) => d.key)).toEqual(['peak-2025-08', 'trough-2026-09']);
  });
});
