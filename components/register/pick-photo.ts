import * as ImagePicker from 'expo-image-picker';
import { Platform } from 'react-native';

/**
 * One photo from the camera (native) or a file chooser (web, where the browser may offer the camera too).
 * Returns null when cancelled; throws with a readable message when the camera is not allowed.
 */
export async function pickPhoto(): Promise<ImagePicker.ImagePickerAsset | null> {
  const options: ImagePicker.ImagePickerOptions = { mediaTypes: ['images'], quality: 0.8, exif: false };
  if (Platform.OS === 'web') {
    const result = await ImagePicker.launchImageLibraryAsync(options);
    return result.canceled ? null : result.assets[0] ?? null;
  }
  const permission = await ImagePicker.requestCameraPermissionsAsync();
  if (!permission.granted) throw new Error('Isoledger is not allowed to use the camera. Allow it in the phone’s settings to add photos.');
  const result = await ImagePicker.launchCameraAsync(options);
  return result.canceled ? null : result.assets[0] ?? null;
}
