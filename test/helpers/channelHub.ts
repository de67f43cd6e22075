/** Tab channels that deliver each message to every other member, synchronously like a test needs. */
import type { ChannelLike, TabMessage } from '../../src/state/tabLock';

export function channelHub() {
  const members: ChannelLike[] = [];
  const sent: TabMessage[] = [];
  return {
    sent,
    join(): ChannelLike {
      const channel: ChannelLike = {
        onmessage: null,
        postMessage(message) {
          sent.push(message);
          for (const other of members) if (other !== channel) other.onmessage?.({ data: message } as MessageEvent<TabMessage>);
        },
        close: () => void members.splice(members.indexOf(channel), 1),
      };
      members.push(channel);
      return channel;
    },
  };
}
