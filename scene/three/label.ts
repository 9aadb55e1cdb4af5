import { SCENE } from "@/model/palette";
import { CanvasTexture, LinearFilter, SRGBColorSpace, Sprite, SpriteMaterial } from "three";

// Text labels drawn into a canvas texture with the page's own font (nothing fetched), shown as sprites
// that always face the camera and are never hidden behind the solids.

/** A sprite label whose text and colour can be changed in place. */
export class Label {
  readonly sprite: Sprite;
  private readonly canvas: HTMLCanvasElement;
  private readonly texture: CanvasTexture;
  private text = "";
  private color = "";
  heightMm = 4;

  constructor() {
    this.canvas = document.createElement("canvas");
    this.texture = new CanvasTexture(this.canvas);
    this.texture.colorSpace = SRGBColorSpace;
    this.texture.minFilter = LinearFilter;
    const material = new SpriteMaterial({ map: this.texture, depthTest: false, depthWrite: false, transparent: true });
    this.sprite = new Sprite(material);
    this.sprite.renderOrder = 10;
    this.sprite.center.set(0, 0.5);
  }

  /** Redraws the texture when the text or colour changed. */
  set(text: string, color: string) {
    if (text === this.text && color === this.color) return;
    this.text = text;
    this.color = color;
    const px = 44;
    const ctx = this.canvas.getContext("2d");
    if (!ctx) return;
    // The page's own (self-hosted) face, whatever name the font loader gave it.
    const family = getComputedStyle(document.body).fontFamily || "ui-sans-serif, sans-serif";
    const font = `600 ${px}px ${family}`;
    ctx.font = font;
    const w = Math.ceil(ctx.measureText(text).width) + 28;
    if (w !== this.canvas.width || px + 24 !== this.canvas.height) {
      // A texture's storage is sized once on upload: a new size needs a fresh upload.
      this.texture.dispose();
      this.canvas.width = w;
      this.canvas.height = px + 24;
    }
    ctx.font = font;
    ctx.clearRect(0, 0, this.canvas.width, this.canvas.height);
    ctx.globalAlpha = 0.92;
    ctx.fillStyle = SCENE.labelGround;
    ctx.strokeStyle = color;
    ctx.lineWidth = 3;
    ctx.beginPath();
    ctx.roundRect(1.5, 1.5, w - 3, px + 21, 10);
    ctx.fill();
    ctx.globalAlpha = 1;
    ctx.stroke();
    ctx.fillStyle = color;
    ctx.textBaseline = "middle";
    ctx.fillText(text, 14, (px + 24) / 2 + 2);
    this.texture.needsUpdate = true;
    this.resize();
  }

  resize() {
    const aspect = this.canvas.width / Math.max(1, this.canvas.height);
    this.sprite.scale.set(this.heightMm * aspect, this.heightMm, 1);
  }

  dispose() {
    this.texture.dispose();
    (this.sprite.material as SpriteMaterial).dispose();
  }
}
