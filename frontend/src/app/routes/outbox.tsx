import { Alert } from '@mui/material';
import { PageHeader } from '../../components/layout/page-header';
import { OutboxList } from '../../features/mail/components/outbox-list';

export default function OutboxRoute() {
  return (
    <>
      <PageHeader
        title="Outbox"
        subtitle="Development only: e-mail caught by the local fake mail server instead of being delivered"
      />
      <Alert severity="info" sx={{ mb: 2 }}>
        With SMTP_HOST set, mail goes to that server and this page is not available.
      </Alert>
      <OutboxList />
    </>
  );
}
