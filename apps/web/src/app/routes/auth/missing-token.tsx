import { Anchor, Text } from '@mantine/core';
import { Link } from 'react-router-dom';

export function MissingToken({ what, retryHref, retryLabel }: { what: string; retryHref: string; retryLabel: string }) {
  return (
    <>
      <Text role="alert">
        This {what} link is incomplete. Open it again from the e-mail, or copy the whole address into the browser.
      </Text>
      <Anchor component={Link} to={retryHref} mt="md" display="inline-block">
        {retryLabel}
      </Anchor>
    </>
  );
}
