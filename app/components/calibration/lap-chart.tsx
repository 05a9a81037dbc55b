/**
 * Measured laps beside the model's lap before and after the fit (recharts; loaded in the browser
 * only). The table beside it holds the same numbers for reading without scripts and for print.
 */
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";

export type LapChartData = { lap: number; measured: number; before: number; after: number }[];

export default function LapChart({ data }: { data: LapChartData }) {
  return (
    <ResponsiveContainer width="100%" height={280}>
      <LineChart data={data} margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
        <CartesianGrid stroke="#e7e0d2" />
        <XAxis dataKey="lap" label={{ value: "lap", position: "insideBottomRight", offset: -4 }} />
        <YAxis domain={["auto", "auto"]} unit=" s" width={64} />
        <Tooltip formatter={(v) => `${Number(v).toFixed(2)} s`} labelFormatter={(l) => `Lap ${l}`} />
        <Legend />
        <Line
          name="Measured"
          dataKey="measured"
          stroke="#1f5c4c"
          strokeWidth={2}
          dot
          isAnimationActive={false}
        />
        <Line
          name="Model, as entered"
          dataKey="before"
          stroke="#a9b3bf"
          strokeDasharray="6 4"
          dot={false}
          isAnimationActive={false}
        />
        <Line
          name="Model, fitted"
          dataKey="after"
          stroke="#d2692f"
          strokeWidth={2}
          dot={false}
          isAnimationActive={false}
        />
      </LineChart>
    </ResponsiveContainer>
  );
}
