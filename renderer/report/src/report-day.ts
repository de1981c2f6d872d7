// Which day the one-day charts of a persona show: the last working day that still has its whole
// following night inside the run (so the melatonin chart is complete), else the second-to-last
// day, else day 0.
export function representativeDay(days: number, workMinutesPerHour: readonly number[] | undefined): number {
  const lastFull = Math.max(0, days - 2);
  if (workMinutesPerHour !== undefined) {
    for (let d = lastFull; d >= 0; d--) {
      let minutes = 0;
      for (let h = d * 24; h < d * 24 + 24; h++) minutes += workMinutesPerHour[h] ?? 0;
      if (minutes >= 60) return d;
    }
  }
  return lastFull;
}
