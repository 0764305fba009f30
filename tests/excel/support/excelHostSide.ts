/**
 * The host's side of Office's custom-functions protocol, played in the page
 * so that Office's own scripts (office.js and the host file it loads) can run
 * unmodified against it. This is the only part of the chain the tests supply:
 *
 * - `_richApiNativeBridge` is the object Excel desktop (Windows, Mac) puts on
 *   the page before any script runs; Office's host file finds it and calls
 *   `HostBridge.init` with it (see `excel-win32-16.01.debug.js` in
 *   @microsoft/office-js). Office then sets `onMessageFromHost` on it, and
 *   sends results through `sendMessageToHost`.
 * - A recalculation reaches the add-in as a generic message (type 3) whose
 *   entries are invocations (category 1, type 1000) of the form
 *   `[invocationId, functionName, parameterValues, address, flags]`; flag 4 is
 *   "errors allowed as inputs", set when functions.json says
 *   `allowErrorForDataTypeAny`.
 * - Office answers with a ProcessQuery request (type 1) holding a
 *   `SetInvocationArrayResults` action, `[id, succeeded, value, errorCode?, outboundData?]`
 *   per invocation; the host replies with a response of the same id.
 *
 * The message shapes are read from Office's own runtime code in that package
 * (CustomFunctionProxy._batchInvocationEntries, _convertCustomFunctionInvocationResultToArray,
 * HostBridge, HostBridgeRequestExecutor), not from Excel itself, which is not
 * available here; DEVELOPERS.md says what that leaves untested.
 */

/** One invocation result as Office reports it to the host. */
export type InvocationResult = [id: number, succeeded: boolean, value: unknown, errorCode?: number, outboundData?: unknown];

/** The flag Excel sets on an invocation when the function allows errors as inputs. */
export const ALLOW_ERRORS_FLAG = 4;

/** Runs in the page before any script (addInitScript): installs the bridge and a CSP violation log. */
export function installExcelHostSide(): void {
  interface Recorded {
    results: Record<number, unknown[]>;
    messages: number;
    csp: string[];
  }
  const recorded: Recorded = { results: {}, messages: 0, csp: [] };
  const w = window as unknown as Record<string, unknown>;
  w.__excelHost = recorded;
  document.addEventListener('securitypolicyviolation', (e) => recorded.csp.push(`${e.violatedDirective} ${e.blockedURI}`));
  const bridge: { onMessageFromHost?: (text: string) => void; sendMessageToHost(text: string): void } = {
    sendMessageToHost(text: string) {
      recorded.messages += 1;
      const message = JSON.parse(text) as {
        id?: number;
        type: number;
        message?: { body?: { Actions?: { Name?: string; ArgumentInfo?: { Arguments?: unknown[] } }[] } };
      };
      for (const action of message.message?.body?.Actions ?? []) {
        if (action.Name !== 'SetInvocationArrayResults') continue;
        const entries = (action.ArgumentInfo?.Arguments?.[0] ?? []) as unknown[][];
        for (const entry of entries) recorded.results[entry[0] as number] = entry;
      }
      // Answer requests that wait for a response, as the host does, so Office's sync settles.
      if (message.type === 1 && typeof message.id === 'number') {
        const reply = { id: message.id, type: 2, message: { statusCode: 200, headers: {}, body: { Results: [] } } };
        setTimeout(() => bridge.onMessageFromHost?.(JSON.stringify(reply)), 0);
      }
    },
  };
  w._richApiNativeBridge = bridge;
}

/** Runs in the page: sends one recalculation batch to the add-in through the bridge, as the host does. */
export function sendInvocations(
  invocations: [id: number, name: string, parameterValues: unknown[], address: string, flags: number][],
): void {
  const bridge = (window as unknown as { _richApiNativeBridge: { onMessageFromHost?: (text: string) => void } })._richApiNativeBridge;
  if (bridge.onMessageFromHost === undefined) throw new Error('Office never connected to the host bridge');
  const entries = invocations.map((invocation) => ({
    messageCategory: 1,
    messageType: 1000,
    targetId: '',
    message: JSON.stringify(invocation),
  }));
  bridge.onMessageFromHost(JSON.stringify({ type: 3, message: { entries } }));
}
