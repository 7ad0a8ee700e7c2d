/**
 * A keydown as a browser hands it to react-native-web's handlers: enough of an event for its press
 * responder (target, currentTarget, nativeEvent, persist) and a record of preventDefault.
 */
export function keyDown(key: string) {
  let prevented = false;
  const target = { getAttribute: () => null, tagName: 'DIV' };
  return {
    event: {
      key,
      repeat: false,
      target,
      currentTarget: target,
      nativeEvent: { key, type: 'keydown' },
      persist: () => {},
      preventDefault: () => {
        prevented = true;
      },
      stopPropagation: () => {},
    },
    prevented: () => prevented,
  };
}
