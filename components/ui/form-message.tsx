export function FormMessage({
  message,
  tone = "error",
}: {
  message?: string;
  tone?: "error" | "success";
}) {
  if (!message) return null;
  const styles =
    tone === "error"
      ? "border-red-200 bg-red-50 text-red-800"
      : "border-lagoon-100 bg-lagoon-50 text-lagoon-700";
  return (
    <p
      role={tone === "error" ? "alert" : "status"}
      className={`rounded-md border px-3 py-2 text-sm ${styles}`}
    >
      {message}
    </p>
  );
}
