import { useOutbox } from "../../api/handoffs";
import { Alert } from "../../components/Alert";
import { Card, PageHeader } from "../../components/PageHeader";
import { Loading, QueryError } from "../../components/QueryState";
import { isOutboxUnavailable } from "../../outbox/OutboxLink";
import { OutboxMessages } from "../../outbox/OutboxMessages";

/** The local mail catcher's inbox (development only, project owners): what hand-offs sent. */
export function OutboxPage() {
  const outbox = useOutbox({ refetchInterval: 5000 });
  return (
    <>
      <PageHeader title="Outbox">
        <p className="mt-1 text-sm text-paper-600">E-mails caught by the local mail server in development; nothing here left this machine.</p>
      </PageHeader>
      <Card>
        {outbox.isPending && <Loading label="Loading messages…" />}
        {outbox.isError &&
          (isOutboxUnavailable(outbox.error) ? (
            <Alert tone="caution" title="No outbox here">
              The outbox exists only in development, for project owners.
            </Alert>
          ) : (
            <QueryError error={outbox.error} title="Could not load the outbox" onRetry={() => void outbox.refetch()} />
          ))}
        {outbox.isSuccess && <OutboxMessages messages={outbox.data} />}
      </Card>
    </>
  );
}
