/** Poll an assertion until it passes (frames update after a macrotask or two). */
export async function waitFor(assertion: () => void, timeoutMs = 2000): Promise<void> {
  const start = Date.now();
  for (;;) {
    try {
      assertion();
      return;
    } catch (error) {
      if (Date.now() - start > timeoutMs) throw error;
      await new Promise(resolve => setTimeout(resolve, 5));
    }
  }
}
