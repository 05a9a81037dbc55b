// Placeholder while the page is being built.
export default function Page() {
  return <p>Not built yet.</p>;
}
