import { Notice } from "./notice";

// What a versioned save can answer besides success: someone else saved first (409), or the
// server refused the input. Used by every screen that edits a versioned document.
type Refusal = { status?: number; message: string; issues: { field: string; message: string }[] };

export function SaveNotices({ what, conflict, onReload, error }: { what: string; conflict: string | null; onReload: () => void; error: Refusal | null }) {
  return (
    <>
      {conflict !== null && (
        <div className="mb-6">
          <Notice tone="caution" title={`Someone else saved this ${what}`}>
            {conflict}{" "}
            <button type="button" className="font-semibold underline" onClick={onReload}>
              Reload their version
            </button>{" "}
            (your unsaved changes on this screen will be replaced).
          </Notice>
        </div>
      )}
      {error && error.status !== 409 && (
        <div className="mb-6">
          <Notice tone="fault" title={error.message}>
            {error.issues.length > 0 && (
              <ul className="list-disc pl-5">
                {error.issues.map((i) => (
                  <li key={i.field}>
                    {i.field}: {i.message}
                  </li>
                ))}
              </ul>
            )}
          </Notice>
        </div>
      )}
    </>
  );
}
