import { Outlet } from "react-router";

// Placeholder while the guard is being built.
export default function Page() {
  return <Outlet />;
}
